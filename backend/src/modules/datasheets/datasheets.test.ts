import { createHash, randomBytes } from 'node:crypto';
import fsp from 'node:fs/promises';
import path from 'node:path';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DatasheetDtoSchema, DatasheetListResponseSchema, PartRevisionListResponseSchema, type DatasheetDto } from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { renderOpAmp } from '../../../test/datasheet-fixtures';
import { makePdf } from './extraction/test-support/make-pdf';
import { runParseJob } from './datasheets.service';

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let editor: Agent;
let viewer: Agent;

beforeAll(async () => {
  ctx = await createTestContext({}, { parseWorkers: 1 });
  editor = (await ctx.agentFor('editor')).agent;
  viewer = (await ctx.agentFor('viewer')).agent;
});
afterAll(() => ctx.close());

const unique = () => randomBytes(3).toString('hex').toUpperCase();

async function filesInStorage(): Promise<string[]> {
  const out: string[] = [];
  async function walk(dir: string) {
    for (const entry of await fsp.readdir(dir, { withFileTypes: true }).catch(() => [])) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) await walk(full);
      else out.push(path.relative(ctx.storageDir, full));
    }
  }
  await walk(ctx.storageDir);
  return out.sort();
}

const rowCount = async () => Number((await ctx.db.query('SELECT count(*)::int AS n FROM datasheets'))[0].n);

function upload(agent: Agent, files: { name: string; data: Buffer }[], fields: Record<string, string> = {}) {
  let req = agent.post('/api/datasheets');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  for (const f of files) req = req.attach('files', f.data, { filename: f.name, contentType: 'application/pdf' });
  return req;
}

async function waitForStatus(id: string, statuses: string[], timeoutMs = 20_000): Promise<DatasheetDto> {
  const started = Date.now();
  for (;;) {
    const res = await editor.get(`/api/datasheets/${id}`).expect(200);
    const sheet = DatasheetDtoSchema.parse(res.body);
    if (statuses.includes(sheet.status)) return sheet;
    if (Date.now() - started > timeoutMs) throw new Error(`Datasheet ${id} stayed ${sheet.status}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

async function createOpAmp(partNumber: string, manufacturer: string) {
  const res = await editor
    .post('/api/parts')
    .send({ family: 'op-amp', partNumber, manufacturer, lifecycle: 'active', rohsStatus: 'compliant', parameters: { slewRate: { typ: 5e6 } } })
    .expect(201);
  return res.body as { id: string; version: number };
}

describe('datasheet upload, parsing and download', () => {
  it('stores a PDF once, parses it in the background and serves the same bytes back', async () => {
    const pn = `QX${unique()}`;
    const pdf = await renderOpAmp(pn, 'Quillfeather Analog');
    const res = await upload(editor, [{ name: `${pn}.pdf`, data: pdf }]).expect(201);
    const [item] = res.body.items;
    expect(item).toMatchObject({ fileName: `${pn}.pdf`, byteSize: pdf.length, pageCount: 1, status: 'queued' });
    expect(item.sha256).toBe(createHash('sha256').update(pdf).digest('hex'));

    const parsed = await waitForStatus(item.id, ['ready', 'failed']);
    expect(parsed.failureReason).toBeNull();
    expect(parsed.status).toBe('ready');
    expect(parsed.extraction!.identity.partNumber?.value).toBe(pn);
    const slew = parsed.extraction!.proposals.find((p) => p.key === 'slewRate');
    // 9 V/µs = 9 × 10⁶ V/s (SI prefix micro = 10⁻⁶).
    expect(slew?.value.typ).toBeCloseTo(9e6, -3);
    expect(slew?.source.page).toBe(1);
    expect(slew?.source.snippet).toMatch(/slew rate/i);

    const file = await viewer.get(`/api/datasheets/${item.id}/file?download=1`).buffer(true).expect(200);
    expect(file.headers['content-type']).toBe('application/pdf');
    expect(file.headers['content-disposition']).toMatch(new RegExp(`^attachment; filename="?${pn}\\.pdf"?`));
    expect(Buffer.compare(file.body as Buffer, pdf)).toBe(0);
    const inline = await viewer.get(`/api/datasheets/${item.id}/file`).expect(200);
    expect(inline.headers['content-disposition']).toMatch(/^inline/);

    const list = DatasheetListResponseSchema.parse((await viewer.get('/api/datasheets').expect(200)).body);
    expect(list.items.find((d) => d.id === item.id)?.proposalCount).toBeGreaterThan(0);
  });

  it('recognises the same bytes as a duplicate and keeps nothing new', async () => {
    const pdf = await renderOpAmp(`QD${unique()}`, 'Quillfeather Analog');
    const first = await upload(editor, [{ name: 'first.pdf', data: pdf }]).expect(201);
    const before = { rows: await rowCount(), files: await filesInStorage() };
    const again = await upload(editor, [{ name: 'renamed copy.pdf', data: pdf }]).expect(422);
    expect(again.body.error.code).toBe('upload_rejected');
    expect(again.body.files).toEqual([expect.objectContaining({ fileName: 'renamed copy.pdf', code: 'duplicate', existingId: first.body.items[0].id })]);
    expect(again.body.files[0].message).toContain('first.pdf');
    expect({ rows: await rowCount(), files: await filesInStorage() }).toEqual(before);
  });

  it('refuses a whole upload when one file is bad, and names that file', async () => {
    const good = await renderOpAmp(`QM${unique()}`, 'Quillfeather Analog');
    const before = { rows: await rowCount(), files: await filesInStorage() };
    const res = await upload(editor, [
      { name: 'good.pdf', data: good },
      { name: 'notes.pdf', data: Buffer.from('these are my notes, not a PDF\n') },
    ]).expect(422);
    expect(res.body.files).toEqual([expect.objectContaining({ fileName: 'notes.pdf', code: 'not-pdf' })]);
    expect({ rows: await rowCount(), files: await filesInStorage() }).toEqual(before);
  });

  it('answers clearly for an empty file, a truncated one, and a request that is not an upload', async () => {
    const before = { rows: await rowCount(), files: await filesInStorage() };
    const empty = await upload(editor, [{ name: 'empty.pdf', data: Buffer.alloc(0) }]).expect(422);
    expect(empty.body.files[0].code).toBe('empty');
    const pdf = await renderOpAmp(`QT${unique()}`, 'Quillfeather Analog');
    const truncated = await upload(editor, [{ name: 'cut.pdf', data: pdf.subarray(0, Math.floor(pdf.length / 2)) }]).expect(422);
    expect(truncated.body.files[0].code).toBe('truncated');
    const none = await editor.post('/api/datasheets').field('partId', '').expect((r) => expect([400, 422]).toContain(r.status));
    expect(none.body.error.message).toBeTruthy();
    const json = await editor.post('/api/datasheets').send({ files: [] }).expect(415);
    expect(json.body.error.code).toBe('multipart_required');
    expect({ rows: await rowCount(), files: await filesInStorage() }).toEqual(before);
  });

  it('says which file is encrypted, looks scanned or has an absurd page count, and keeps none of them', async () => {
    const before = { rows: await rowCount(), files: await filesInStorage() };
    const text = [{ text: 'Slew rate 9 V/µs', x: 50, y: 50 }];
    const encrypted = Buffer.from(await makePdf([{ texts: text }], { userPassword: 'secret' }));
    const scanned = Buffer.from(await makePdf([{ rects: [{ x: 50, y: 50, width: 300, height: 12 }] }]));
    const pages = ctx.config.datasheets.maxPages + 1;
    const huge = Buffer.from(await makePdf(Array.from({ length: pages }, () => ({ texts: text }))));
    const res = await upload(editor, [
      { name: 'locked.pdf', data: encrypted },
      { name: 'scan.pdf', data: scanned },
      { name: 'huge.pdf', data: huge },
    ]).expect(422);
    expect(res.body.files.map((f: { fileName: string; code: string }) => [f.fileName, f.code])).toEqual([
      ['locked.pdf', 'encrypted'],
      ['scan.pdf', 'no-text'],
      ['huge.pdf', 'too-many-pages'],
    ]);
    expect(res.body.files[1].message).toMatch(/scanned/);
    expect(res.body.files[2].message).toContain(String(pages));
    expect({ rows: await rowCount(), files: await filesInStorage() }).toEqual(before);
  });

  it('refuses more files than allowed at once', async () => {
    const files = Array.from({ length: ctx.config.datasheets.maxFiles + 1 }, (_, i) => ({ name: `f${i}.pdf`, data: Buffer.from(`%PDF-1.4 ${i}`) }));
    const res = await upload(editor, files).expect(413);
    expect(res.body.error).toMatchObject({ code: 'too_many_files' });
    expect(res.body.error.message).toContain(String(ctx.config.datasheets.maxFiles));
  });
});

describe('size limit', () => {
  let small: TestContext;
  beforeAll(async () => {
    small = await createTestContext({ DATASHEET_MAX_MB: '0.001' });
  });
  afterAll(() => small.close());

  it('refuses a file over the configured limit before keeping anything', async () => {
    const { agent } = await small.agentFor('editor');
    const pdf = await renderOpAmp(`QL${unique()}`, 'Quillfeather Analog');
    expect(pdf.length).toBeGreaterThan(1100);
    const res = await upload(agent, [{ name: 'big.pdf', data: pdf }]).expect(413);
    expect(res.body.error.code).toBe('too_large');
    expect(res.body.error.message).toMatch(/0\.001 MB|limit/);
    expect(await fsp.readdir(small.storageDir)).toEqual([]);
  });
});

describe('review and apply', () => {
  it('applies accepted and edited values to an existing part with a revision naming the datasheet', async () => {
    const pn = `QA${unique()}`;
    const part = await createOpAmp(pn, 'Quillfeather Analog');
    const pdf = await renderOpAmp(pn, 'Quillfeather Analog', 12, 1);
    const up = await upload(editor, [{ name: `${pn} rev B.pdf`, data: pdf }], { partId: part.id }).expect(201);
    const sheet = await waitForStatus(up.body.items[0].id, ['ready']);
    expect(sheet.part?.id).toBe(part.id);
    const slew = sheet.extraction!.proposals.find((p) => p.key === 'slewRate')!;
    const gbw = sheet.extraction!.proposals.find((p) => p.key === 'gainBandwidth')!;

    const nothing = await editor.post(`/api/datasheets/${sheet.id}/apply`).send({ target: 'existing', partId: part.id, version: part.version }).expect(422);
    expect(nothing.body.error.code).toBe('nothing_to_apply');

    await editor.patch(`/api/datasheets/${sheet.id}/proposals/${slew.id}`).send({ decision: 'accepted' }).expect(200);
    const bad = await editor.patch(`/api/datasheets/${sheet.id}/proposals/${gbw.id}`).send({ decision: 'edited', value: { max: 1 } }).expect(400);
    expect(bad.body.error.issues[0].message).toMatch(/gives typ/);
    const edited = await editor.patch(`/api/datasheets/${sheet.id}/proposals/${gbw.id}`).send({ decision: 'edited', value: { typ: 3.5e6 } }).expect(200);
    expect(edited.body.extraction.proposals.find((p: { id: string }) => p.id === gbw.id)).toMatchObject({ decision: 'edited', editedValue: { typ: 3.5e6 } });
    await viewer.patch(`/api/datasheets/${sheet.id}/proposals/${slew.id}`).send({ decision: 'rejected' }).expect(403);

    // Someone else edits the part meanwhile: the stale apply answers 409 with the part as it is now.
    await editor.patch(`/api/parts/${part.id}`).send({ version: part.version, description: 'Edited meanwhile' }).expect(200);
    const stale = await editor.post(`/api/datasheets/${sheet.id}/apply`).send({ target: 'existing', partId: part.id, version: part.version }).expect(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(stale.body.current.version).toBe(part.version + 1);

    const applied = await editor.post(`/api/datasheets/${sheet.id}/apply`).send({ target: 'existing', partId: part.id, version: part.version + 1 }).expect(200);
    expect(applied.body.part.parameters.slewRate.typ).toBeCloseTo(12e6, -3);
    expect(applied.body.part.parameters.gainBandwidth).toEqual({ typ: 3.5e6 });
    expect(applied.body.datasheet.status).toBe('applied');
    expect(applied.body.revision).toMatchObject({ source: 'datasheet', datasheet: { id: sheet.id, fileName: `${pn} rev B.pdf` } });

    const history = PartRevisionListResponseSchema.parse((await viewer.get(`/api/parts/${part.id}/revisions`).expect(200)).body);
    expect(history.items[0]!.datasheet).toEqual({ id: sheet.id, fileName: `${pn} rev B.pdf` });
    expect(history.items[0]!.changes.map((c) => c.field)).toEqual(expect.arrayContaining(['parameters.slewRate', 'parameters.gainBandwidth']));

    // Archiving the part keeps its datasheets.
    await editor.delete(`/api/parts/${part.id}`).expect(200);
    const kept = await viewer.get(`/api/datasheets?partId=${part.id}`).expect(200);
    expect(kept.body.items.map((d: { id: string }) => d.id)).toEqual([sheet.id]);
  });

  it('creates a new part from the reviewed identity', async () => {
    const pn = `QN${unique()}`;
    const up = await upload(editor, [{ name: `${pn}.pdf`, data: await renderOpAmp(pn, 'Quillfeather Analog', 7, 2) }]).expect(201);
    const sheet = await waitForStatus(up.body.items[0].id, ['ready']);
    for (const p of sheet.extraction!.proposals) await editor.patch(`/api/datasheets/${sheet.id}/proposals/${p.id}`).send({ decision: 'accepted' }).expect(200);
    const res = await editor
      .post(`/api/datasheets/${sheet.id}/apply`)
      .send({ target: 'new', family: 'op-amp', partNumber: pn, manufacturer: 'Quillfeather Analog', package: 'DIP-8' })
      .expect(200);
    expect(res.body.part).toMatchObject({ partNumber: pn, family: 'op-amp', package: 'DIP-8' });
    expect(res.body.part.parameters.slewRate.typ).toBeCloseTo(7e6, -3);
    expect(res.body.revision).toMatchObject({ version: 1, source: 'datasheet', datasheet: { id: sheet.id } });
    const mismatch = await editor.post('/api/parts').send({ family: 'led', partNumber: `L${pn}`, manufacturer: 'Quillfeather Analog', lifecycle: 'active', rohsStatus: 'compliant' }).expect(201);
    const wrong = await editor.post(`/api/datasheets/${sheet.id}/apply`).send({ target: 'existing', partId: mismatch.body.id, version: 1 }).expect(422);
    expect(wrong.body.error.code).toBe('family_mismatch');
  });

  it('marks a job failed with its reason when the file cannot be read, and lets an editor retry', async () => {
    const quiet = await createTestContext();
    try {
      const { agent } = await quiet.agentFor('editor');
      const up = await upload(agent, [{ name: 'lost.pdf', data: await renderOpAmp(`QF${unique()}`, 'Quillfeather Analog', 5, 3) }]).expect(201);
      const id = up.body.items[0].id;
      for (const f of await fsp.readdir(quiet.storageDir, { recursive: true })) {
        if (String(f).endsWith('.pdf')) await fsp.rm(path.join(quiet.storageDir, String(f)));
      }
      await runParseJob({ db: quiet.db, storage: quiet.storage, limits: quiet.config.datasheets }, id);
      const failed = (await agent.get(`/api/datasheets/${id}`).expect(200)).body;
      expect(failed.status).toBe('failed');
      expect(failed.failureReason).toMatch(/unexpected error/);
      const retried = await agent.post(`/api/datasheets/${id}/retry`).expect(200);
      expect(retried.body.status).toBe('queued');
      await agent.post(`/api/datasheets/${id}/retry`).expect(409);
    } finally {
      await quiet.close();
    }
  });
});
