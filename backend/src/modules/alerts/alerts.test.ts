import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { PartCreateBodySchema, type OutboxMessage, type PartCreateBody } from '@understudy/shared-types';
import { createTestContext, waitForMail, type TestContext } from '../../../test/context';
import type { User } from '../../entities';
import type { Mailer } from '../../mail/mailer';
import { QUEUES } from '../../queue/job-queue';
import { createPart } from '../parts/parts.service';
import { insertBom } from './alerts-fixtures';
import { fanOutChange, sendDigests, type AlertDeps } from './alerts.service';
import { startAlertWorkers } from './alerts.worker';

type Agent = Awaited<ReturnType<TestContext['agentFor']>>['agent'];

let ctx: TestContext;
let deps: AlertDeps;
let editor: Agent;
const ids: Record<string, string> = {};

// Invented parts: a dual op amp about to go obsolete, its stand-ins, and a part nobody's BOM uses.
const PARTS: PartCreateBody[] = [
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-A4558', lifecycle: 'active', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-A4560', lifecycle: 'active', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-A072', lifecycle: 'active', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-A9000', lifecycle: 'active', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-D1', lifecycle: 'active', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-D2', lifecycle: 'active', parameters: { channels: { typ: 2 } } },
];

const mailsTo = (user: Pick<User, 'email'>): OutboxMessage[] => ctx.mail.messages().filter((m) => m.to.includes(user.email.toLowerCase()));

async function until<T>(what: string, probe: () => Promise<T | undefined | false>, timeoutMs = 10_000): Promise<T> {
  const started = Date.now();
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() - started > timeoutMs) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

async function changesOf(partId: string): Promise<{ id: string; kind: string; before: unknown; after: unknown }[]> {
  return ctx.db.query(`SELECT id, kind, before, after FROM part_changes WHERE part_id = $1 ORDER BY created_at`, [partId]);
}

/** Waits until the worker has written the change's notices and mailed every one that is due at once. */
async function settled(changeId: string, notices: number) {
  await until(`fan-out of ${changeId}`, async () => {
    const [row] = (await ctx.db.query(
      `SELECT count(*)::int AS total,
              count(*) FILTER (WHERE n.emailed_at IS NULL AND coalesce(a.delivery, 'immediate') = 'immediate')::int AS due
         FROM notifications n LEFT JOIN alert_preferences a ON a.user_id = n.user_id WHERE n.change_id = $1`,
      [changeId],
    )) as { total: number; due: number }[];
    return row!.total === notices && row!.due === 0;
  });
}

async function setLifecycle(partId: string, lifecycle: string) {
  const current = await editor.get(`/api/parts/${partId}`).expect(200);
  await editor.patch(`/api/parts/${partId}`).send({ version: current.body.version, lifecycle }).expect(200);
}

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE notifications, part_changes, alert_preferences, boms, bom_mapping_memory, equivalents, part_revisions, parts, manufacturers CASCADE');
  for (const p of PARTS) ids[p.partNumber] = (await createPart(ctx.db, null, PartCreateBodySchema.parse(p))).id;
  ({ agent: editor } = await ctx.agentFor('editor'));
  deps = { db: ctx.db, mailer: ctx.mailer, config: ctx.config };
  // The real worker on this context's queue; the digest is sent by hand here, so no schedule.
  await startAlertWorkers(deps, ctx.queue, { digestCron: '0 7 * * *', workers: 1 }, { schedule: false });
});
afterAll(() => ctx.close());
beforeEach(() => ctx.mail.clear());

describe('lifecycle alerts', () => {
  let ada: User;
  let ben: User;
  let cy: User;
  let colleague: User;
  let bomIds: Record<string, string>;

  beforeAll(async () => {
    [ada, ben, cy, colleague] = [await newUser(), await newUser(), await newUser(), await newUser()];
    bomIds = {
      fuzz: await insertBom(ctx.db, { ownerId: ada.id, name: 'Fuzz rev B', lines: [ids['QS-A4558']!, ids['QS-A4558']!, ids['BA-A072']!], sharedWith: [colleague.id] }),
      tremolo: await insertBom(ctx.db, {
        ownerId: ada.id,
        name: 'Tremolo rev C',
        // Here the part is the replacement chosen for a line, not its match; it counts all the same.
        lines: [{ partId: ids['BA-A072']!, replacementPartId: ids['QS-A4558']! }],
      }),
      ben: await insertBom(ctx.db, { ownerId: ben.id, name: 'Phaser', lines: [ids['QS-A4558']!] }),
      // Cy stopped watching this one.
      cy: await insertBom(ctx.db, { ownerId: cy.id, name: 'Old delay', watched: false, lines: [ids['QS-A4558']!] }),
    };
  });

  it('mails each owner of a watched BOM once per change, naming every affected BOM; nobody else', async () => {
    await setLifecycle(ids['QS-A4558']!, 'obsolete');
    const [change] = await changesOf(ids['QS-A4558']!);
    expect(change).toMatchObject({ kind: 'lifecycle', before: 'active', after: 'obsolete' });
    await settled(change!.id, 2);

    const toAda = mailsTo(ada);
    expect(toAda).toHaveLength(1);
    expect(toAda[0]!.subject).toBe('QS-A4558 is now obsolete — used in 2 of your BOMs');
    const text = toAda[0]!.text;
    expect(text).toContain('Quillon Semiconductor QS-A4558 changed lifecycle: Active → Obsolete.');
    expect(text).toContain(`Fuzz rev B (2 lines): ${ctx.config.appUrl}/boms/${bomIds.fuzz}`);
    expect(text).toContain(`Tremolo rev C (1 line): ${ctx.config.appUrl}/boms/${bomIds.tremolo}`);
    expect(text).toContain(`${ctx.config.appUrl}/settings/alerts`);
    expect(toAda[0]!.html).toContain(`href="${ctx.config.appUrl}/boms/${bomIds.fuzz}"`);

    const toBen = mailsTo(ben);
    expect(toBen).toHaveLength(1);
    expect(toBen[0]!.subject).toBe('QS-A4558 is now obsolete — used in 1 of your BOMs');
    expect(toBen[0]!.text).toContain('Phaser (1 line)');

    expect(mailsTo(cy)).toHaveLength(0);
    expect(mailsTo(colleague)).toHaveLength(0);
    expect(ctx.mail.messages()).toHaveLength(2);

    const notices: { user_id: string }[] = await ctx.db.query(`SELECT user_id FROM notifications WHERE change_id = $1`, [change!.id]);
    expect(notices.map((n) => n.user_id).sort()).toEqual([ada.id, ben.id].sort());
  });

  it("shows the change in each affected BOM's check history, and only there", async () => {
    const checks = async (bomId: string) =>
      (await ctx.db.query(`SELECT trigger, summary FROM bom_checks WHERE bom_id = $1`, [bomId])) as { trigger: string; summary: { obsolete: number } }[];
    expect(await checks(bomIds.fuzz!)).toEqual([expect.objectContaining({ trigger: 'change', summary: expect.objectContaining({ obsolete: 2 }) })]);
    expect(await checks(bomIds.tremolo!)).toEqual([expect.objectContaining({ trigger: 'change' })]);
    expect(await checks(bomIds.ben!)).toHaveLength(1);
    // Not watched: not checked either.
    expect(await checks(bomIds.cy!)).toEqual([]);
  });

  it('sends nothing new when the same fan-out runs again', async () => {
    const [change] = await changesOf(ids['QS-A4558']!);
    expect(await fanOutChange(deps, change!.id)).toEqual({ notified: 0, emailed: 0 });
    expect(await fanOutChange(deps, change!.id)).toEqual({ notified: 0, emailed: 0 });
    expect(ctx.mail.messages()).toHaveLength(0);
    const checks: unknown[] = await ctx.db.query(`SELECT 1 FROM bom_checks WHERE bom_id = $1`, [bomIds.fuzz]);
    expect(checks).toHaveLength(1);
    const counted: { count: number }[] = await ctx.db.query(`SELECT count(*)::int AS count FROM notifications WHERE change_id = $1`, [change!.id]);
    expect(counted[0]!.count).toBe(2);
  });

  it('records nothing when an edit leaves the lifecycle as it was', async () => {
    const current = await editor.get(`/api/parts/${ids['BA-A072']}`).expect(200);
    await editor.patch(`/api/parts/${ids['BA-A072']}`).send({ version: current.body.version, description: 'Bipolar dual, re-tested.' }).expect(200);
    expect(await changesOf(ids['BA-A072']!)).toEqual([]);
  });

  it('leaves a refused mail unsent for the retry, and never mails a notice twice', async () => {
    await setLifecycle(ids['BA-A072']!, 'last-time-buy');
    const [change] = await changesOf(ids['BA-A072']!);
    // Ada's BOMs use BA-A072 too; let the worker finish with them first.
    await settled(change!.id, 1);
    ctx.mail.clear();

    // A change written without its job and fanned out by hand, with a mail server that refuses Eve the first time.
    const dave = await newUser();
    const eve = await newUser();
    await insertBom(ctx.db, { ownerId: dave.id, name: 'Dave’s reverb', lines: [ids['QS-A9000']!] });
    await insertBom(ctx.db, { ownerId: eve.id, name: 'Eve’s chorus', lines: [ids['QS-A9000']!] });
    const inserted: { id: string }[] = await ctx.db.query(
      `INSERT INTO part_changes (part_id, kind, before, after) VALUES ($1, 'lifecycle', '"active"', '"nrnd"') RETURNING id`,
      [ids['QS-A9000']],
    );
    const changeId = inserted[0]!.id;
    const refusing: Mailer = {
      async send(mail) {
        if (mail.to === eve.email) throw new Error('421 try again later');
        await ctx.mailer.send(mail);
      },
      close() {},
    };
    await expect(fanOutChange({ ...deps, mailer: refusing }, changeId)).rejects.toThrow(/1 of 2 alert mails/);
    expect(mailsTo(dave)).toHaveLength(1);
    expect(mailsTo(eve)).toHaveLength(0);
    const stamps: { user_id: string; emailed_at: Date | null }[] = await ctx.db.query(`SELECT user_id, emailed_at FROM notifications WHERE change_id = $1`, [changeId]);
    expect(stamps.find((s) => s.user_id === dave.id)?.emailed_at).not.toBeNull();
    expect(stamps.find((s) => s.user_id === eve.id)?.emailed_at).toBeNull();

    // The retry mails only what is still unsent.
    expect(await fanOutChange(deps, changeId)).toEqual({ notified: 0, emailed: 1 });
    expect(mailsTo(dave)).toHaveLength(1);
    expect(mailsTo(eve)).toHaveLength(1);
    expect(mailsTo(eve)[0]!.subject).toBe('QS-A9000 is now not recommended for new designs — used in 1 of your BOMs');
  });
});

describe('approved-equivalent alerts', () => {
  let fay: User;
  let gus: User;

  beforeAll(async () => {
    fay = await newUser();
    gus = await newUser();
    await insertBom(ctx.db, { ownerId: fay.id, name: 'Fay’s overdrive', lines: [ids['QS-D1']!] });
    await insertBom(ctx.db, { ownerId: gus.id, name: 'Gus’s compressor', lines: [ids['QS-D2']!, ids['QS-D2']!] });
  });

  it('a rejection alerts nobody', async () => {
    await editor
      .post('/api/equivalents')
      .send({ partId: ids['QS-D1'], equivalentId: ids['QS-D2'], status: 'rejected', use: 'clipping stage', note: 'Clips earlier.' })
      .expect(201);
    expect(await changesOf(ids['QS-D1']!)).toEqual([]);
    expect(await changesOf(ids['QS-D2']!)).toEqual([]);
  });

  it('approving alerts the owners of BOMs using either part, each about the other part', async () => {
    const created = await editor
      .post('/api/equivalents')
      .send({ partId: ids['QS-D1'], equivalentId: ids['QS-D2'], status: 'approved', use: 'input buffer', note: 'Same pinout, measured.' })
      .expect(201);
    const [forD1] = await changesOf(ids['QS-D1']!);
    const [forD2] = await changesOf(ids['QS-D2']!);
    expect(forD1).toMatchObject({ kind: 'approved-equivalent', after: { partId: ids['QS-D2'], partNumber: 'QS-D2', use: 'input buffer' } });
    expect(forD2).toMatchObject({ kind: 'approved-equivalent', after: { partId: ids['QS-D1'], partNumber: 'QS-D1' } });
    await settled(forD1!.id, 1);
    await settled(forD2!.id, 1);

    const toFay = mailsTo(fay);
    expect(toFay).toHaveLength(1);
    expect(toFay[0]!.subject).toBe('QS-D1 has an approved equivalent: QS-D2 — used in 1 of your BOMs');
    expect(toFay[0]!.text).toContain('approved Quillon Semiconductor QS-D2 in place of Quillon Semiconductor QS-D1 for “input buffer”. Note: Same pinout, measured.');
    const toGus = mailsTo(gus);
    expect(toGus).toHaveLength(1);
    expect(toGus[0]!.subject).toBe('QS-D2 has an approved equivalent: QS-D1 — used in 1 of your BOMs');
    expect(toGus[0]!.text).toContain('Gus’s compressor (2 lines)');

    // Editing the note of a ruling already approved is not news.
    await editor.patch(`/api/equivalents/${created.body.id}`).send({ note: 'Same pinout, measured twice.' }).expect(200);
    expect(await changesOf(ids['QS-D1']!)).toHaveLength(1);
  });

  it('a rejected ruling changed to approved alerts as well', async () => {
    const rejected = (await ctx.db.query(`SELECT id FROM equivalents WHERE status = 'rejected'`)) as { id: string }[];
    await editor.patch(`/api/equivalents/${rejected[0]!.id}`).send({ status: 'approved' }).expect(200);
    const changes = await changesOf(ids['QS-D1']!);
    expect(changes).toHaveLength(2);
    expect(changes[1]).toMatchObject({ after: { use: 'clipping stage', note: 'Clips earlier.' } });
    await settled(changes[1]!.id, 1);
    expect(mailsTo(fay)).toHaveLength(1);
  });
});

describe('daily digest', () => {
  it('mails nothing at change time, then one digest covering both changes, and nothing on a second run', async () => {
    const { agent, user: hal } = await ctx.agentFor('viewer');
    await agent.put('/api/me/alert-preferences').send({ delivery: 'daily' }).expect(200);
    const lamp = (await createPart(ctx.db, null, PartCreateBodySchema.parse({ family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-H1', lifecycle: 'active', parameters: { channels: { typ: 2 } } }))).id;
    const tube = (await createPart(ctx.db, null, PartCreateBodySchema.parse({ family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-H2', lifecycle: 'nrnd', parameters: { channels: { typ: 2 } } }))).id;
    const bom = await insertBom(ctx.db, { ownerId: hal.id, name: 'Hal’s preamp', lines: [lamp, tube] });

    await setLifecycle(lamp, 'obsolete');
    await setLifecycle(tube, 'last-time-buy');
    const [a] = await changesOf(lamp);
    const [b] = await changesOf(tube);
    await settled(a!.id, 1);
    await settled(b!.id, 1);
    expect(mailsTo(hal)).toHaveLength(0);

    const first = await sendDigests(deps, new Date());
    expect(first).toEqual({ people: 1, notices: 2, failed: 0 });
    const digests = mailsTo(hal);
    expect(digests).toHaveLength(1);
    expect(digests[0]!.subject).toBe('Understudy daily digest: 2 changes to parts in your BOMs');
    expect(digests[0]!.text).toContain('1. BA-H1 is now obsolete');
    expect(digests[0]!.text).toContain('2. BA-H2 is now last-time buy');
    expect(digests[0]!.text).toContain(`Hal’s preamp (1 line): ${ctx.config.appUrl}/boms/${bom}`);

    expect(await sendDigests(deps, new Date())).toEqual({ people: 0, notices: 0, failed: 0 });
    expect(mailsTo(hal)).toHaveLength(1);
    const list = await agent.get('/api/notifications').expect(200);
    expect(list.body.items.every((n: { emailedAt: string | null }) => n.emailedAt !== null)).toBe(true);
  });

  it('the scheduled digest job sends the same digest through the queue', async () => {
    const { agent, user: jo } = await ctx.agentFor('viewer');
    await agent.put('/api/me/alert-preferences').send({ delivery: 'daily' }).expect(200);
    const part = (await createPart(ctx.db, null, PartCreateBodySchema.parse({ family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-J1', lifecycle: 'active', parameters: { channels: { typ: 2 } } }))).id;
    await insertBom(ctx.db, { ownerId: jo.id, name: 'Jo’s tuner', lines: [part] });
    await setLifecycle(part, 'nrnd');
    const [change] = await changesOf(part);
    await settled(change!.id, 1);
    await ctx.queue.send(QUEUES.alertDigest, {});
    const digest = await waitForMail(ctx.mail, jo.email);
    expect(digest.subject).toBe('Understudy daily digest: 1 change to parts in your BOMs');
  });

  it('keeps the digest on a schedule, in UTC, from the configured cron', async () => {
    await startAlertWorkers(deps, ctx.queue, { digestCron: '30 6 * * 1-5', workers: 0 });
    const rows: { name: string; timezone: string }[] = await ctx.db.query(`SELECT name, timezone FROM pgboss.schedule WHERE cron = '30 6 * * 1-5'`);
    expect(rows).toHaveLength(1);
    expect(rows[0]!.name).toMatch(/alert-digest$/);
    expect(rows[0]!.timezone).toBe('UTC');
  });

  it("'off' keeps the notice in the app and mails nothing, now or in a digest", async () => {
    const { agent, user: ivy } = await ctx.agentFor('viewer');
    await agent.put('/api/me/alert-preferences').send({ delivery: 'off' }).expect(200);
    const part = (await createPart(ctx.db, null, PartCreateBodySchema.parse({ family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-I1', lifecycle: 'active', parameters: { channels: { typ: 2 } } }))).id;
    await insertBom(ctx.db, { ownerId: ivy.id, name: 'Ivy’s looper', lines: [part] });
    await setLifecycle(part, 'obsolete');
    const [change] = await changesOf(part);
    await settled(change!.id, 1);
    await sendDigests(deps, new Date());
    expect(mailsTo(ivy)).toHaveLength(0);
    const list = await agent.get('/api/notifications').expect(200);
    expect(list.body).toMatchObject({ unread: 1, items: [{ title: 'BA-I1 is now obsolete', emailedAt: null, boms: [{ name: 'Ivy’s looper', lines: 1 }] }] });
  });
});

async function newUser(): Promise<User> {
  return (await ctx.agentFor('viewer')).user;
}
