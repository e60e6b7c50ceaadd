import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AlertPreferencesSchema, NotificationDtoSchema, NotificationListResponseSchema, PartCreateBodySchema } from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { createPart } from '../parts/parts.service';
import { insertBom } from './alerts-fixtures';
import { fanOutChange } from './alerts.service';

type Agent = Awaited<ReturnType<TestContext['agentFor']>>['agent'];

let ctx: TestContext;
let owner: Agent;
let ownerId: string;
let other: Agent;
let otherId: string;
const parts: string[] = [];

/** A lifecycle change of one of the parts, fanned out at once (without the queue). */
async function change(partId: string, before: string, after: string): Promise<void> {
  const rows: { id: string }[] = await ctx.db.query(
    `INSERT INTO part_changes (part_id, kind, before, after) VALUES ($1, 'lifecycle', to_jsonb($2::text), to_jsonb($3::text)) RETURNING id`,
    [partId, before, after],
  );
  await fanOutChange({ db: ctx.db, mailer: ctx.mailer, config: ctx.config }, rows[0]!.id);
}

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE notifications, part_changes, alert_preferences, boms, equivalents, part_revisions, parts, manufacturers CASCADE');
  for (const partNumber of ['QS-N1', 'QS-N2', 'QS-N3']) {
    parts.push((await createPart(ctx.db, null, PartCreateBodySchema.parse({ family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber, parameters: {} }))).id);
  }
  ({ agent: owner, user: { id: ownerId } } = await ctx.agentFor('viewer'));
  ({ agent: other, user: { id: otherId } } = await ctx.agentFor('editor'));
  await insertBom(ctx.db, { ownerId, name: 'Wah rev A', lines: parts });
  await insertBom(ctx.db, { ownerId: otherId, name: 'Octave up', lines: [parts[0]!] });
  await change(parts[0]!, 'active', 'nrnd');
  await change(parts[1]!, 'active', 'obsolete');
  await change(parts[2]!, 'obsolete', 'active');
});
afterAll(() => ctx.close());

describe('notices', () => {
  let ids: string[];

  it("lists the caller's own notices, newest first, with the unread count", async () => {
    const list = NotificationListResponseSchema.parse((await owner.get('/api/notifications').expect(200)).body);
    expect(list.unread).toBe(3);
    expect(list.items.map((n) => n.title)).toEqual(['QS-N3 is now active', 'QS-N2 is now obsolete', 'QS-N1 is now not recommended for new designs']);
    expect(list.items[1]).toMatchObject({
      kind: 'lifecycle',
      part: { id: parts[1], partNumber: 'QS-N2' },
      boms: [{ name: 'Wah rev A', lines: 1 }],
      readAt: null,
    });
    expect(list.items[1]!.body).toBe('Quillon Semiconductor QS-N2 changed lifecycle: Active → Obsolete. Used in Wah rev A (1 line). Open the BOM to choose a replacement.');
    expect(list.items[1]!.emailedAt).not.toBeNull();
    ids = list.items.map((n) => n.id);

    const theirs = NotificationListResponseSchema.parse((await other.get('/api/notifications').expect(200)).body);
    expect(theirs.items.map((n) => n.title)).toEqual(['QS-N1 is now not recommended for new designs']);
    expect(theirs.items[0]!.boms).toEqual([expect.objectContaining({ name: 'Octave up' })]);
  });

  it("marks one read, keeps the first reading time, and answers 404 for someone else's notice", async () => {
    const read = NotificationDtoSchema.parse((await owner.post(`/api/notifications/${ids[1]}/read`).expect(200)).body);
    expect(read.readAt).not.toBeNull();
    const again = NotificationDtoSchema.parse((await owner.post(`/api/notifications/${ids[1]}/read`).expect(200)).body);
    expect(again.readAt).toBe(read.readAt);

    const refused = await other.post(`/api/notifications/${ids[0]}/read`).expect(404);
    expect(refused.body.error.code).toBe('not_found');
    await owner.post('/api/notifications/00000000-0000-4000-8000-000000000000/read').expect(404);
    await owner.post('/api/notifications/not-an-id/read').expect(400);

    const unread = NotificationListResponseSchema.parse((await owner.get('/api/notifications?unread=1').expect(200)).body);
    expect(unread.unread).toBe(2);
    expect(unread.items.map((n) => n.id)).toEqual([ids[0], ids[2]]);
    // The other person's notice is untouched.
    expect((await other.get('/api/notifications').expect(200)).body.unread).toBe(1);
  });

  it('marks all read', async () => {
    await owner.post('/api/notifications/read-all').expect(204);
    const list = NotificationListResponseSchema.parse((await owner.get('/api/notifications').expect(200)).body);
    expect(list.unread).toBe(0);
    expect(list.items.every((n) => n.readAt)).toBe(true);
    expect((await owner.get('/api/notifications?unread=1').expect(200)).body.items).toEqual([]);
    expect((await other.get('/api/notifications').expect(200)).body.unread).toBe(1);
  });
});

describe('alert preferences', () => {
  it("answers 'immediate' until changed, and keeps what was put", async () => {
    expect(AlertPreferencesSchema.parse((await owner.get('/api/me/alert-preferences').expect(200)).body)).toEqual({ delivery: 'immediate' });
    expect((await owner.put('/api/me/alert-preferences').send({ delivery: 'daily' }).expect(200)).body).toEqual({ delivery: 'daily' });
    expect((await owner.get('/api/me/alert-preferences').expect(200)).body).toEqual({ delivery: 'daily' });
    expect((await owner.put('/api/me/alert-preferences').send({ delivery: 'off' }).expect(200)).body).toEqual({ delivery: 'off' });
    // Each person has their own.
    expect((await other.get('/api/me/alert-preferences').expect(200)).body).toEqual({ delivery: 'immediate' });
  });

  it('refuses a delivery that is not one of the three (400 naming the field)', async () => {
    for (const body of [{ delivery: 'weekly' }, {}, { delivery: null }]) {
      const res = await owner.put('/api/me/alert-preferences').send(body).expect(400);
      expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['body.delivery']);
    }
    expect((await owner.get('/api/me/alert-preferences').expect(200)).body).toEqual({ delivery: 'off' });
  });
});
