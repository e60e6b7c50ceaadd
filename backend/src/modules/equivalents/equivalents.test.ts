import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EquivalentDtoSchema, PartCreateBodySchema, type PartCreateBody } from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { createPart } from '../parts/parts.service';

type Agent = Awaited<ReturnType<TestContext['agentFor']>>['agent'];

let ctx: TestContext;
let editor: Agent;
let editorId: string;
let viewer: Agent;
const ids: Record<string, string> = {};

// Invented parts: three interchangeable-looking duals and one photocell from another family.
const PARTS: PartCreateBody[] = [
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-E100', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-E101', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'BA-E200', parameters: { channels: { typ: 2 } } },
  { family: 'photoresistor', manufacturer: 'Brackenridge Audio', partNumber: 'BA-CELL9', parameters: {} },
];

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE equivalents, part_revisions, parts, manufacturers CASCADE');
  for (const p of PARTS) ids[p.partNumber] = (await createPart(ctx.db, null, PartCreateBodySchema.parse(p))).id;
  ({ agent: editor, user: { id: editorId } } = await ctx.agentFor('editor'));
  ({ agent: viewer } = await ctx.agentFor('viewer'));
});
afterAll(() => ctx.close());

const rule = (partId: string, equivalentId: string, over: Record<string, unknown> = {}) => ({ partId, equivalentId, status: 'approved', use: 'fuzz gain stage', note: 'Same bias point, measured.', ...over });

describe('equivalents', () => {
  it('records a ruling from either side as one pair, and refuses the same pair and use again (409)', async () => {
    const created = await editor.post('/api/equivalents').send(rule(ids['QS-E100']!, ids['QS-E101']!)).expect(201);
    const dto = EquivalentDtoSchema.parse(created.body);
    expect(dto).toMatchObject({ partId: ids['QS-E100'], equivalentId: ids['QS-E101'], status: 'approved', use: 'fuzz gain stage' });
    expect(dto.decidedBy?.id).toBe(editorId);

    // Reversed, and the use typed in other case: the same ruling.
    const again = await editor.post('/api/equivalents').send(rule(ids['QS-E101']!, ids['QS-E100']!, { use: 'Fuzz Gain Stage', status: 'rejected' })).expect(409);
    expect(again.body.error.code).toBe('equivalent_exists');

    // Another use is another ruling.
    await editor.post('/api/equivalents').send(rule(ids['QS-E101']!, ids['QS-E100']!, { use: 'tone stack buffer', status: 'rejected' })).expect(201);
  });

  it('refuses a part paired with itself, a pair across families and an unknown part (422)', async () => {
    const self = await editor.post('/api/equivalents').send(rule(ids['QS-E100']!, ids['QS-E100']!)).expect(422);
    expect(self.body.error.code).toBe('same_part');
    const cross = await editor.post('/api/equivalents').send(rule(ids['QS-E100']!, ids['BA-CELL9']!)).expect(422);
    expect(cross.body.error.code).toBe('family_mismatch');
    const unknown = await editor.post('/api/equivalents').send(rule(ids['QS-E100']!, '00000000-0000-4000-8000-00000000abcd')).expect(422);
    expect(unknown.body.error.code).toBe('unknown_part');
  });

  it('answers 400 naming the field for a body that is not a ruling', async () => {
    const res = await editor.post('/api/equivalents').send({ partId: 'nope', equivalentId: ids['QS-E101'], status: 'maybe', use: ' ' }).expect(400);
    const paths = res.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['body.partId', 'body.status', 'body.use']));
  });

  it("lists a part's rulings seen from that part, approved first", async () => {
    const res = await viewer.get(`/api/parts/${ids['QS-E101']}/equivalents`).expect(200);
    const items = res.body.items.map((i: unknown) => EquivalentDtoSchema.parse(i));
    expect(items.map((i: { status: string }) => i.status)).toEqual(['approved', 'rejected']);
    for (const item of items) expect(item).toMatchObject({ partId: ids['QS-E101'], equivalentId: ids['QS-E100'] });
    await viewer.get('/api/parts/00000000-0000-4000-8000-00000000abcd/equivalents').expect(404);
  });

  it('changes a ruling, keeps the fields not sent, and refuses a use that collides (409)', async () => {
    const created = EquivalentDtoSchema.parse(
      (await editor.post('/api/equivalents').send(rule(ids['QS-E100']!, ids['BA-E200']!, { note: 'Listened side by side.' })).expect(201)).body,
    );
    const { agent: other, user } = await ctx.agentFor('admin');
    const patched = EquivalentDtoSchema.parse((await other.patch(`/api/equivalents/${created.id}`).send({ status: 'rejected' }).expect(200)).body);
    expect(patched).toMatchObject({ status: 'rejected', note: 'Listened side by side.', use: 'fuzz gain stage' });
    expect(patched.decidedBy?.id).toBe(user.id);

    await editor.patch(`/api/equivalents/${created.id}`).send({ use: 'tone stack buffer' }).expect(200);
    await editor.post('/api/equivalents').send(rule(ids['QS-E100']!, ids['BA-E200']!, { use: 'any' })).expect(201);
    const clash = await editor.patch(`/api/equivalents/${created.id}`).send({ use: 'ANY' }).expect(409);
    expect(clash.body.error.code).toBe('equivalent_exists');
    await editor.patch('/api/equivalents/00000000-0000-4000-8000-00000000abcd').send({ status: 'approved' }).expect(404);
  });

  it('deletes a ruling (204, then 404) and leaves an audit trail', async () => {
    const created = EquivalentDtoSchema.parse((await editor.post('/api/equivalents').send(rule(ids['QS-E101']!, ids['BA-E200']!)).expect(201)).body);
    await editor.delete(`/api/equivalents/${created.id}`).expect(204);
    await editor.delete(`/api/equivalents/${created.id}`).expect(404);
    const events: { action: string }[] = await ctx.db.query(`SELECT action FROM audit_events WHERE subject_type = 'Equivalent' AND subject_id = $1 ORDER BY created_at`, [created.id]);
    expect(events.map((e) => e.action)).toEqual(['equivalent.created', 'equivalent.deleted']);
  });
});
