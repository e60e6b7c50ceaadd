import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PartCreateBodySchema, PartDtoSchema } from '@understudy/shared-types';
import { loadFixtureCatalog } from '../../../test/catalog-fixture';
import { createTestContext, type TestContext } from '../../../test/context';
import { readImport } from './parts-transfer.service';

let ctx: TestContext;
let ids: Map<string, string>;
let viewer: Awaited<ReturnType<TestContext['agentFor']>>['agent'];
let editor: Awaited<ReturnType<TestContext['agentFor']>>['agent'];

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE part_revisions, parts, manufacturers CASCADE');
  ids = await loadFixtureCatalog(ctx.db);
  viewer = (await ctx.agentFor('viewer')).agent;
  editor = (await ctx.agentFor('editor')).agent;
});
afterAll(() => ctx.close());

const numbers = (res: request.Response) => res.body.items.map((p: { partNumber: string }) => p.partNumber);

describe('search', () => {
  it('lists one family with a total count, sorted by part number', async () => {
    const res = await viewer.get('/api/parts').query({ family: 'op-amp' }).expect(200);
    expect(res.body.total).toBe(4);
    expect(numbers(res)).toEqual(['CV2207', 'CV2208', 'OD-10V', 'OD-4558X']);
    expect(PartDtoSchema.parse(res.body.items[0]).manufacturer.name).toBe('Fixture Linear');
  });

  it('forgives case, spaces and dashes in part numbers ("cv 2207" finds CV2207 first)', async () => {
    expect(numbers(await viewer.get('/api/parts').query({ q: 'cv 2207' }).expect(200))[0]).toBe('CV2207');
    expect(numbers(await viewer.get('/api/parts').query({ q: 'od4558x' }).expect(200))).toEqual(['OD-4558X']);
  });

  it('forgives a typo in a part number through trigram similarity', async () => {
    const res = await viewer.get('/api/parts').query({ q: 'cv2270' }).expect(200);
    expect(numbers(res)).toContain('CV2207');
  });

  it('finds words in descriptions and manufacturer names', async () => {
    expect(numbers(await viewer.get('/api/parts').query({ q: 'buffers' }).expect(200))).toEqual(['OD-4558X']);
    expect(numbers(await viewer.get('/api/parts').query({ q: 'oddfellow', family: 'op-amp' }).expect(200))).toEqual(['OD-10V', 'OD-4558X']);
  });

  it('finds op amps that run on a 9 V supply with slew rate at least 5 V/µs, typed as engineers write it', async () => {
    // Supply is a range parameter: the part's span must cover 9 V (common practice, no source: a 9 V battery pedal).
    const res = await viewer.get('/api/parts').query({ family: 'op-amp', 'supplyVoltage.min': '9 V', 'supplyVoltage.max': '9V', 'slewRate.min': '5 V/µs' }).expect(200);
    expect(numbers(res)).toEqual(['CV2207', 'OD-4558X']);
    // "u" for micro, and a dual supply typed as ±4.5 V (a 9 V span).
    const again = await viewer.get('/api/parts').query({ family: 'op-amp', 'supplyVoltage.min': '±4.5 V', 'slewRate.min': '5V/us' }).expect(200);
    expect(numbers(again)).toEqual(['CV2207', 'OD-4558X']);
  });

  it('filters on enums, booleans, lifecycle and RoHS', async () => {
    expect(numbers(await viewer.get('/api/parts').query({ family: 'op-amp', inputStage: 'jfet' }).expect(200))).toEqual(['CV2207', 'OD-10V']);
    expect(numbers(await viewer.get('/api/parts').query({ family: 'op-amp', singleSupply: 'false' }).expect(200))).toEqual(['OD-10V']);
    expect(numbers(await viewer.get('/api/parts').query({ lifecycle: 'obsolete,last-time-buy' }).expect(200))).toEqual(['CV2207', 'OD-10V']);
    expect(numbers(await viewer.get('/api/parts').query({ rohs: 'non-compliant' }).expect(200))).toEqual(['OD-LDR5']);
  });

  it('sorts by a parameter in either direction and pages with a stable total', async () => {
    expect(numbers(await viewer.get('/api/parts').query({ family: 'op-amp', sort: '-slewRate' }).expect(200))).toEqual(['OD-10V', 'CV2207', 'OD-4558X', 'CV2208']);
    const page2 = await viewer.get('/api/parts').query({ family: 'op-amp', sort: 'slewRate', page: 2, pageSize: 3 }).expect(200);
    expect(numbers(page2)).toEqual(['OD-10V']);
    expect(page2.body.total).toBe(4);
    const beyond = await viewer.get('/api/parts').query({ family: 'op-amp', page: 9, pageSize: 3 }).expect(200);
    expect(beyond.body).toMatchObject({ items: [], total: 4 });
  });

  it('answers 400 with the field for a value it cannot read, an unknown parameter or sort', async () => {
    const bad = await viewer.get('/api/parts').query({ family: 'op-amp', 'slewRate.min': 'fast' }).expect(400);
    expect(bad.body.error.issues[0].path).toBe('query.slewRate.min');
    const wrongUnit = await viewer.get('/api/parts').query({ family: 'op-amp', 'slewRate.min': '5 Ω' }).expect(400);
    expect(wrongUnit.body.error.issues[0].path).toBe('query.slewRate.min');
    await viewer.get('/api/parts').query({ family: 'op-amp', 'darkResistance.min': '1M' }).expect(400);
    await viewer.get('/api/parts').query({ 'slewRate.min': '5V/us' }).expect(400);
    await viewer.get('/api/parts').query({ family: 'op-amp', sort: 'colour' }).expect(400);
  });
});

describe('editing', () => {
  it('creates a part with a shared pin layout and a first revision', async () => {
    const res = await editor
      .post('/api/parts')
      .send({ family: 'op-amp', manufacturer: 'fixture linear', partNumber: 'CV-3000', pinLayout: 'dip8-dual-opamp', parameters: { slewRate: { typ: 9e6 } } })
      .expect(201);
    // The manufacturer is matched ignoring case.
    expect(res.body.manufacturer.name).toBe('Fixture Linear');
    // Standard 8-pin dual op amp: V+ on pin 8, V− on pin 4 (common practice, no source).
    expect(res.body.pinMap['8']).toBe('V+');
    expect(res.body.pinMap['4']).toMatch(/^V[−-]$/);
    const dup = await editor.post('/api/parts').send({ family: 'op-amp', manufacturer: 'Fixture Linear', partNumber: 'cv 3000' }).expect(409);
    expect(dup.body.error.code).toBe('part_exists');
    const revisions = await viewer.get(`/api/parts/${res.body.id}/revisions`).expect(200);
    expect(revisions.body.items[0]).toMatchObject({ version: 1, source: 'created' });
  });

  it('rejects parameters the family does not have, and values out of order', async () => {
    const res = await editor.post('/api/parts').send({ family: 'led', manufacturer: 'X', partNumber: 'L1', parameters: { slewRate: { typ: 1 } } }).expect(400);
    expect(res.body.error.issues[0].path).toMatch(/^body\.parameters/);
    await editor.post('/api/parts').send({ family: 'op-amp', manufacturer: 'X', partNumber: 'L2', parameters: { supplyVoltage: { min: 30, max: 5 } } }).expect(400);
  });

  it('fixes a value, bumps the version and writes a field-level revision naming the editor', async () => {
    const id = ids.get('CV2208')!;
    const before = (await viewer.get(`/api/parts/${id}`).expect(200)).body;
    const parameters = { ...before.parameters, slewRate: { typ: 0.5e6 } };
    const res = await editor.patch(`/api/parts/${id}`).send({ version: before.version, parameters, description: 'Bipolar dual.' }).expect(200);
    expect(res.body.version).toBe(before.version + 1);
    const [latest] = (await viewer.get(`/api/parts/${id}/revisions`).expect(200)).body.items;
    expect(latest.actor.name).toBe('Test editor');
    expect(latest.changes).toEqual([
      { field: 'description', before: 'Bipolar dual, steady and slow.', after: 'Bipolar dual.' },
      { field: 'parameters.slewRate', before: { typ: 0.6e6 }, after: { typ: 0.5e6 } },
    ]);
  });

  it('answers 409 with the current part to an edit made against a stale version — no lost update', async () => {
    const id = ids.get('OD-4558X')!;
    const start = (await viewer.get(`/api/parts/${id}`).expect(200)).body;
    await editor.patch(`/api/parts/${id}`).send({ version: start.version, description: 'First edit wins.' }).expect(200);
    const stale = await editor.patch(`/api/parts/${id}`).send({ version: start.version, description: 'Second edit, stale.' }).expect(409);
    expect(stale.body.error.code).toBe('version_conflict');
    expect(stale.body.current).toMatchObject({ description: 'First edit wins.', version: start.version + 1 });
    expect((await viewer.get(`/api/parts/${id}`)).body.description).toBe('First edit wins.');
  });

  it('archives a part: hidden from search, still readable, with its history', async () => {
    const id = ids.get('OD-10V')!;
    const res = await editor.delete(`/api/parts/${id}`).expect(200);
    expect(res.body.archived).toBe(true);
    expect(numbers(await viewer.get('/api/parts').query({ family: 'op-amp' }))).not.toContain('OD-10V');
    expect(numbers(await viewer.get('/api/parts').query({ family: 'op-amp', includeArchived: '1' }))).toContain('OD-10V');
    await viewer.get(`/api/parts/${id}`).expect(200);
    await viewer.delete(`/api/parts/${id}`).expect(403);
    await viewer.post(`/api/parts/${id}/restore`).expect(403);
    const restored = await editor.post(`/api/parts/${id}/restore`).expect(200);
    expect(restored.body.archived).toBe(false);
    const [latest] = (await viewer.get(`/api/parts/${id}/revisions`)).body.items;
    expect(latest).toMatchObject({ source: 'restored', changes: [{ field: 'archived', before: true, after: false }] });
  });
});

describe('import and export', () => {
  it('exports CSV and JSON that read back to the same parts (lossless)', async () => {
    const json = (await viewer.get('/api/parts/export').query({ format: 'json', includeArchived: '1' }).expect(200)).body;
    const csvRes = await viewer.get('/api/parts/export').query({ format: 'csv', includeArchived: '1' }).buffer(true).parse((res, cb) => {
      let data = '';
      res.on('data', (c: Buffer) => (data += c.toString('utf8')));
      res.on('end', () => cb(null, data));
    });
    expect(csvRes.headers['content-disposition']).toMatch(/attachment; filename="?understudy-parts-[\d-]+\.csv"?/);
    const fromCsv = readImport(csvRes.body as string, 'text/csv');
    expect(fromCsv.errors).toEqual([]);
    const normalise = (rows: unknown[]) => rows.map((r) => PartCreateBodySchema.parse(r));
    expect(normalise(fromCsv.rows)).toEqual(normalise(json));
    expect(json.length).toBeGreaterThanOrEqual(5);
  });

  it('flags approved equivalents in both exports, from either side of the pair, and leaves rejected ones out', async () => {
    const use = 'fuzz gain stage';
    await editor.post('/api/equivalents').send({ partId: ids.get('CV2207'), equivalentId: ids.get('OD-4558X'), status: 'approved', use, note: 'Measured in the test rig.' }).expect(201);
    await editor.post('/api/equivalents').send({ partId: ids.get('CV2207'), equivalentId: ids.get('OD-10V'), status: 'rejected', use, note: 'Different supply.' }).expect(201);
    const json = (await viewer.get('/api/parts/export').query({ format: 'json', family: 'op-amp' }).expect(200)).body as { partNumber: string; approvedEquivalents: unknown[] }[];
    const of = (pn: string) => json.find((p) => p.partNumber === pn)!.approvedEquivalents;
    expect(of('CV2207')).toEqual([{ manufacturer: 'Oddfellow Devices', partNumber: 'OD-4558X', use, note: 'Measured in the test rig.' }]);
    expect(of('OD-4558X')).toEqual([{ manufacturer: 'Fixture Linear', partNumber: 'CV2207', use, note: 'Measured in the test rig.' }]);
    expect(of('OD-10V')).toEqual([]);

    const csv = await viewer.get('/api/parts/export').query({ format: 'csv', family: 'op-amp' }).buffer(true).parse((res, cb) => {
      let data = '';
      res.on('data', (c: Buffer) => (data += c.toString('utf8')));
      res.on('end', () => cb(null, data));
    });
    const parsed = Papa.parse<Record<string, string>>(csv.body as string, { header: true });
    expect(parsed.data.find((r) => r.partNumber === 'CV2207')?.approvedEquivalents).toBe(`Oddfellow Devices OD-4558X (${use})`);
    // The column is for reading; an import of the same file still reads cleanly and ignores it.
    expect(readImport(csv.body as string, 'text/csv').errors).toEqual([]);
  });

  it('dry-runs an import, reporting every bad row with its reason and changing nothing', async () => {
    const before = (await viewer.get('/api/parts').query({ includeArchived: '1' })).body.total;
    const csv = [
      'family,manufacturer,partNumber,lifecycle,param:slewRate.typ,param:supplyVoltage.min,param:supplyVoltage.max',
      'op-amp,Import Works,IW-1,active,9V/us,3,30',
      'op-amp,Import Works,IW-2,ancient,1,3,30',
      'transistor,Import Works,IW-3,active,,,',
      'op-amp,Import Works,IW-4,active,fast,,',
      'op-amp,Import Works,IW-1,active,1,3,30',
    ].join('\n');
    const dry = await editor.post('/api/parts/import').query({ dryRun: '1' }).set('content-type', 'text/csv').send(csv).expect(200);
    expect(dry.body).toMatchObject({ dryRun: true, total: 5, created: 1, updated: 0 });
    expect(dry.body.errors.map((e: { row: number }) => e.row)).toEqual([3, 4, 5, 6]);
    expect(dry.body.errors[0].message).toMatch(/lifecycle/);
    expect(dry.body.errors[1].message).toMatch(/family/);
    expect(dry.body.errors[3].message).toMatch(/row 2/);
    const real = await editor.post('/api/parts/import').set('content-type', 'text/csv').send(csv).expect(422);
    expect(real.body.report.errors).toHaveLength(4);
    expect((await viewer.get('/api/parts').query({ includeArchived: '1' })).body.total).toBe(before);
  });

  it('applies a clean import in one go, updating existing parts with an import revision', async () => {
    const rows = [
      { family: 'op-amp', manufacturer: 'Import Works', partNumber: 'IW-10', parameters: { slewRate: { typ: 3e6 } } },
      { family: 'op-amp', manufacturer: 'Fixture Linear', partNumber: 'CV2207', description: 'Updated by import.', lifecycle: 'obsolete', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-dual-opamp', parameters: { channels: { typ: 2 }, supplyVoltage: { min: 6, max: 36 }, singleSupply: { value: true }, slewRate: { typ: 13e6 }, inputStage: { value: 'jfet' } } },
    ];
    const res = await editor.post('/api/parts/import').send(rows).expect(200);
    expect(res.body).toMatchObject({ dryRun: false, created: 1, updated: 1, errors: [] });
    const [latest] = (await viewer.get(`/api/parts/${ids.get('CV2207')}/revisions`)).body.items;
    expect(latest.source).toBe('import');
    expect(latest.changes.map((c: { field: string }) => c.field)).toContain('description');
  });

  it('refuses an empty file and a viewer', async () => {
    await editor.post('/api/parts/import').set('content-type', 'text/csv').send('').expect(400);
    await viewer.post('/api/parts/import').set('content-type', 'text/csv').send('family\n').expect(403);
  });
});
