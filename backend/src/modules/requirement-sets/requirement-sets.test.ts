import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PartCreateBodySchema, PositionResultsSchema, RequirementSetDtoSchema, type RequirementSetBody } from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { createPart } from '../parts/parts.service';

type Agent = Awaited<ReturnType<TestContext['agentFor']>>['agent'];

let ctx: TestContext;
let owner: Agent;
let ownerId: string;
let otherViewer: Agent;
let editor: Agent;

// A 9 V pedal's LED driver stage; an invented op amp so the rerun has something to rank.
const BODY: RequirementSetBody = {
  name: 'LFO driver',
  design: 'Tremolo, rev B',
  requirements: {
    family: 'op-amp',
    supply: { kind: 'single', volts: 9, halfSupplyBias: true },
    signal: { peakVolts: 2, frequencyHz: 20 },
    ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 1000 },
  },
};

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE requirement_sets, equivalents, part_revisions, parts, manufacturers CASCADE');
  await createPart(
    ctx.db,
    null,
    PartCreateBodySchema.parse({
      family: 'op-amp',
      manufacturer: 'Quillon Semiconductor',
      partNumber: 'QS-R900',
      lifecycle: 'active',
      package: 'DIP-8',
      pinLayout: 'dip8-dual-opamp',
      parameters: { channels: { typ: 2 }, supplyVoltage: { min: 3, max: 32 }, singleSupply: { value: true }, slewRate: { typ: 0.5e6 }, outputCurrent: { typ: 20e-3 } },
    }),
  );
  ({ agent: owner, user: { id: ownerId } } = await ctx.agentFor('viewer'));
  ({ agent: otherViewer } = await ctx.agentFor('viewer'));
  ({ agent: editor } = await ctx.agentFor('editor'));
});
afterAll(() => ctx.close());

describe('requirement sets', () => {
  let id: string;

  it('saves a named position for its owner and lists it back', async () => {
    const created = RequirementSetDtoSchema.parse((await owner.post('/api/requirement-sets').send(BODY).expect(201)).body);
    id = created.id;
    expect(created).toMatchObject({ name: 'LFO driver', design: 'Tremolo, rev B', owner: { id: ownerId } });
    expect(created.requirements.allowObsolete).toBe(false);
    const list = await owner.get('/api/requirement-sets').expect(200);
    expect(list.body.items.map((s: unknown) => RequirementSetDtoSchema.parse(s).id)).toEqual([id]);
  });

  it("hides one viewer's set from another: absent from their list, 404 on every route (existence is not leaked)", async () => {
    await otherViewer.post('/api/requirement-sets').send({ ...BODY, name: 'Their own' }).expect(201);
    const list = await otherViewer.get('/api/requirement-sets').expect(200);
    expect(list.body.items.map((s: { name: string }) => s.name)).toEqual(['Their own']);
    await otherViewer.get(`/api/requirement-sets/${id}`).expect(404);
    await otherViewer.get(`/api/requirement-sets/${id}/results`).expect(404);
    await otherViewer.patch(`/api/requirement-sets/${id}`).send({ name: 'Mine now' }).expect(404);
    await otherViewer.delete(`/api/requirement-sets/${id}`).expect(404);
    expect((await owner.get(`/api/requirement-sets/${id}`).expect(200)).body.name).toBe('LFO driver');
  });

  it('lets an editor read every set but not change one they do not own (403)', async () => {
    const list = await editor.get('/api/requirement-sets').expect(200);
    expect(list.body.items.map((s: { name: string }) => s.name).sort()).toEqual(['LFO driver', 'Their own']);
    await editor.get(`/api/requirement-sets/${id}`).expect(200);
    const refused = await editor.patch(`/api/requirement-sets/${id}`).send({ name: 'Edited' }).expect(403);
    expect(refused.body.error.code).toBe('forbidden');
    await editor.delete(`/api/requirement-sets/${id}`).expect(403);
  });

  it('renames a set without touching the fields not sent, and checks new requirements (400)', async () => {
    const renamed = RequirementSetDtoSchema.parse((await owner.patch(`/api/requirement-sets/${id}`).send({ name: 'LFO driver, 2nd try' }).expect(200)).body);
    expect(renamed).toMatchObject({ name: 'LFO driver, 2nd try', design: 'Tremolo, rev B' });
    expect(renamed.requirements.supply?.volts).toBe(9);
    const bad = await owner.patch(`/api/requirement-sets/${id}`).send({ requirements: { family: 'optocoupler' } }).expect(400);
    expect(bad.body.error.issues[0].path).toMatch(/^body\.requirements/);
    await owner.post('/api/requirement-sets').send({ name: '', requirements: BODY.requirements }).expect(400);
  });

  it('reruns the ranking for a saved set', async () => {
    const results = PositionResultsSchema.parse((await owner.get(`/api/requirement-sets/${id}/results`).expect(200)).body);
    expect(results.derived.length).toBeGreaterThan(0);
    expect(results.items.map((m) => m.part.partNumber)).toContain('QS-R900');
  });

  it('deletes a set for its owner (204, then 404)', async () => {
    await owner.delete(`/api/requirement-sets/${id}`).expect(204);
    await owner.get(`/api/requirement-sets/${id}`).expect(404);
  });
});
