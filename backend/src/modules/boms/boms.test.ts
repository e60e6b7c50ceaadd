import iconv from 'iconv-lite';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BOM_EXPORT_COLUMNS,
  BOM_LIMITS,
  BomDetailDtoSchema,
  BomLineDtoSchema,
  BomLineOptionsSchema,
  BomListResponseSchema,
  BomPreviewSchema,
  PartCreateBodySchema,
  partNumberKey,
  type BomCreateBody,
  type BomDetailDto,
  type BomLineDto,
  type PartCreateBody,
} from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { createUser } from '../../../test/factories';
import { createEquivalent } from '../equivalents/equivalents.service';
import { createPart, getPart, updatePart } from '../parts/parts.service';
import { nearestParts } from './bom-matching.service';
import { recheckBom } from './boms.service';

type Agent = Awaited<ReturnType<TestContext['agentFor']>>['agent'];

let ctx: TestContext;
let owner: Agent;
let ownerId: string;
let otherViewer: Agent;
let otherViewerId: string;
let editor: Agent;
let editorId: string;
const ids: Record<string, string> = {};

// Invented parts from invented makers. CV2207 is obsolete with an approved stand-in; OD-10V is a last-time buy;
// OD-LDR5 a cadmium cell; two makers share QX100.
const PARTS: PartCreateBody[] = [
  {
    family: 'op-amp', manufacturer: 'Fixture Linear', partNumber: 'CV2207', lifecycle: 'obsolete', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 6, max: 36 }, singleSupply: { value: true }, slewRate: { typ: 13e6 }, inputStage: { value: 'jfet' } },
  },
  {
    family: 'op-amp', manufacturer: 'Fixture Linear', partNumber: 'CV2208', lifecycle: 'active', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 3, max: 32 }, singleSupply: { value: true }, slewRate: { typ: 0.6e6 }, inputStage: { value: 'bipolar' } },
  },
  {
    family: 'op-amp', manufacturer: 'Oddfellow Devices', partNumber: 'OD-4558X', lifecycle: 'active', rohsStatus: 'compliant', package: 'SOIC-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 4, max: 30 }, singleSupply: { value: true }, slewRate: { typ: 7e6 }, inputStage: { value: 'bipolar' } },
  },
  {
    family: 'op-amp', manufacturer: 'Oddfellow Devices', partNumber: 'OD-10V', lifecycle: 'last-time-buy', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 12, max: 36 }, singleSupply: { value: false }, slewRate: { typ: 20e6 }, inputStage: { value: 'jfet' } },
  },
  {
    family: 'photoresistor', manufacturer: 'Oddfellow Devices', partNumber: 'OD-LDR5', lifecycle: 'active', rohsStatus: 'non-compliant', rohsNote: 'Contains cadmium.',
    parameters: { lightResistance: { min: 5e3, max: 12e3 }, gamma: { typ: 0.7 }, cellMaterial: { value: 'cds' } },
  },
  { family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'QX100', parameters: { channels: { typ: 2 } } },
  { family: 'op-amp', manufacturer: 'Brackenridge Audio', partNumber: 'QX-100', parameters: { channels: { typ: 2 } } },
];

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE boms, bom_mapping_memory, equivalents, part_revisions, parts, manufacturers CASCADE');
  for (const p of PARTS) ids[p.partNumber] = (await createPart(ctx.db, null, PartCreateBodySchema.parse(p))).id;
  ({ agent: owner, user: { id: ownerId } } = await ctx.agentFor('viewer'));
  ({ agent: otherViewer, user: { id: otherViewerId } } = await ctx.agentFor('viewer'));
  ({ agent: editor, user: { id: editorId } } = await ctx.agentFor('editor'));
  await createEquivalent(ctx.db, ctx.queue, editorId, { partId: ids.CV2207!, equivalentId: ids.CV2208!, status: 'approved', use: 'tone stage', note: 'Same pinout; lower slew is fine here.' });
});
afterAll(() => ctx.close());

/** The messy list a purchaser gets: every way a part number is mistyped, plus a bad quantity and a repeated designator. */
const MESSY = [
  'Part Number;Manufacturer;Qty;Designator;Notes',
  'cv2207;Fixture Linear;2;U1, U2;input stage', // row 2: lower case → exact, obsolete
  ' OD 4558X ;;1;U3;', // row 3: extra spaces → exact
  'OD4558X-TR;Oddfellow;1;U4;reel', // row 4: no dash, packing suffix → suffix
  'OD-10V#PBF;;ten;U5;', // row 5: lead-free mark, bad quantity → suffix, at risk (last-time buy)
  '', // row 6: blank, skipped
  'CV2270;;1;U6;typo', // row 7: slipped digits → candidates
  'ZZ-NOPE-9;;1;R1;', // row 8: nothing like it → unmatched
  'OD-LDR5;;1;LDR1;', // row 9: cadmium cell
  'QX100;;1;U1;', // row 10: two makers share it → confirm; U1 also on row 2
  'QX100;Brackenridge Audio Ltd;2;U7-U8;', // row 11: the maker decides
].join('\r\n');

const MAPPING = { partNumber: 0, manufacturer: 1, quantity: 2, designators: 3, notes: 4 };

function body(over: Partial<BomCreateBody> = {}): BomCreateBody {
  return { name: 'Fuzz v2 rev B', text: MESSY, fileName: 'fuzz-v2.csv', encoding: 'utf-8', delimiter: ';', hasHeader: true, mapping: MAPPING, ...over };
}

async function create(agent: Agent, over: Partial<BomCreateBody> = {}): Promise<BomDetailDto> {
  return BomDetailDtoSchema.parse((await agent.post('/api/boms').send(body(over)).expect(201)).body);
}

const byRow = (detail: BomDetailDto, row: number): BomLineDto => detail.lines.find((l) => l.row === row)!;

describe('BOM preview', () => {
  it('reads an uploaded windows-1252 file: encoding, delimiter, header, columns and a mapping from the header words', async () => {
    const file = iconv.encode('Référence fabricant;Qté;Repères;Remarque\nCV2207;2;U1, U2;10 µF\n', 'windows-1252');
    const res = await owner.post('/api/boms/preview').attach('file', file, 'liste.csv').expect(200);
    const preview = BomPreviewSchema.parse(res.body);
    expect(preview).toMatchObject({ encoding: 'windows-1252', delimiter: ';', hasHeader: true, lineCount: 1 });
    expect(preview.columns.map((c) => c.header)).toEqual(['Référence fabricant', 'Qté', 'Repères', 'Remarque']);
    expect(preview.mapping).toEqual({ partNumber: 0, quantity: 1, designators: 2, notes: 3 });
    expect(preview.sampleRows[0]).toEqual(['CV2207', '2', 'U1, U2', '10 µF']);
  });

  it('reads a paste (tab-separated, as a spreadsheet copies it) and honours a given delimiter and header choice', async () => {
    const pasted = BomPreviewSchema.parse((await owner.post('/api/boms/preview').send({ text: 'CV2207\t2\tU1\nOD-10V\t1\tU2' }).expect(200)).body);
    expect(pasted).toMatchObject({ encoding: 'text', delimiter: '\t', hasHeader: false, lineCount: 2, mapping: { partNumber: 0, quantity: 1, designators: 2 } });
    const forced = BomPreviewSchema.parse((await owner.post('/api/boms/preview').send({ text: 'a|b\nc|d', delimiter: '|', hasHeader: true }).expect(200)).body);
    expect(forced).toMatchObject({ delimiter: '|', hasHeader: true, lineCount: 1 });
    const uploaded = BomPreviewSchema.parse((await owner.post('/api/boms/preview').field('delimiter', ';').field('hasHeader', 'false').attach('file', Buffer.from('a;b\nc;d\n'), 'x.csv').expect(200)).body);
    expect(uploaded).toMatchObject({ delimiter: ';', hasHeader: false, lineCount: 2 });
  });

  it('refuses an empty file, a workbook, and a file over the size limit (413) with the reason in details', async () => {
    const empty = await owner.post('/api/boms/preview').attach('file', Buffer.alloc(0), 'empty.csv').expect(400);
    expect(empty.body).toMatchObject({ error: { code: 'bom_empty' }, details: { reason: 'empty', rows: [] } });
    const pasteEmpty = await owner.post('/api/boms/preview').send({ text: '  \n' }).expect(400);
    expect(pasteEmpty.body.details.reason).toBe('empty');
    const xlsx = await owner.post('/api/boms/preview').attach('file', Buffer.from([0x50, 0x4b, 0x03, 0x04, 0, 0]), 'list.xlsx').expect(400);
    expect(xlsx.body).toMatchObject({ error: { code: 'bom_unreadable' }, details: { reason: 'unreadable' } });
    const big = Buffer.alloc(BOM_LIMITS.maxBytes + 1, 'a');
    const tooBig = await owner.post('/api/boms/preview').attach('file', big, 'big.csv').expect(413);
    expect(tooBig.body).toMatchObject({ error: { code: 'bom_too_large' }, details: { reason: 'too-large' } });
    const tooBigPaste = await owner.post('/api/boms/preview').send({ text: big.toString() }).expect(413);
    expect(tooBigPaste.body.error.code).toBe('bom_too_large');
  });
});

describe('BOM check', () => {
  let bom: BomDetailDto;

  it('matches messy spellings and keeps every line, with row numbers as the spreadsheet shows them', async () => {
    bom = await create(owner);
    expect(bom).toMatchObject({ name: 'Fuzz v2 rev B', owner: { id: ownerId }, fileName: 'fuzz-v2.csv', lineCount: 9, delimiter: ';', hasHeader: true });
    expect(bom.columns).toEqual(['Part Number', 'Manufacturer', 'Qty', 'Designator', 'Notes']);
    expect(bom.lines.map((l) => l.row)).toEqual([2, 3, 4, 5, 7, 8, 9, 10, 11]);
    expect(bom.lines).toHaveLength(9);

    expect(byRow(bom, 2).match).toMatchObject({ kind: 'exact', part: { id: ids.CV2207 } });
    expect(byRow(bom, 3).match).toMatchObject({ kind: 'exact', part: { id: ids['OD-4558X'] } });
    expect(byRow(bom, 4).match).toMatchObject({ kind: 'suffix', part: { id: ids['OD-4558X'] }, detail: 'packing suffix -TR set aside' });
    expect(byRow(bom, 5).match).toMatchObject({ kind: 'suffix', part: { id: ids['OD-10V'] }, detail: 'lead-free mark #PBF set aside' });
    const typo = byRow(bom, 7);
    expect(typo.match.kind).toBe('candidates');
    // Two neighbours swapped: 5 of 6 characters in place (0.833), ahead of CV2208 (two edits away, 0.667).
    expect(typo.match.candidates.map((c) => [c.part.id, c.similarity])).toEqual([
      [ids.CV2207, 0.833],
      [ids.CV2208, 0.667],
    ]);
    expect(byRow(bom, 8)).toMatchObject({ status: 'unmatched', risk: 'Not in the catalog', match: { kind: 'unmatched', part: null, candidates: [] } });
    expect(byRow(bom, 10)).toMatchObject({ status: 'confirm', match: { kind: 'candidates' } });
    expect(byRow(bom, 10).match.candidates.map((c) => c.part.id).sort()).toEqual([ids.QX100, ids['QX-100']].sort());
    expect(byRow(bom, 11).match).toMatchObject({ kind: 'exact', part: { id: ids['QX-100'] } });
  });

  it('never offers an obsolete part as a stand-in, though the approval runs both ways', async () => {
    // CV2208 is approved for CV2207; seen from CV2208, that ruling names the obsolete CV2207.
    // Another person's BOM, so the owner's remembered mapping stays as the later tests expect.
    const { agent: purchaser } = await ctx.agentFor('viewer');
    const active = await create(purchaser, { name: 'Active only', text: 'Part Number;Qty\nCV2208;1', mapping: { partNumber: 0, quantity: 1 } });
    expect(active.lines[0]).toMatchObject({ status: 'ok', approvedEquivalents: [] });
  });

  it('judges each line: status, risk in words, approved equivalents, and the summary', async () => {
    expect(byRow(bom, 2)).toMatchObject({ status: 'at-risk', risk: 'Obsolete — 1 approved equivalent' });
    expect(byRow(bom, 2).approvedEquivalents).toEqual([expect.objectContaining({ part: expect.objectContaining({ id: ids.CV2208 }), use: 'tone stage' })]);
    expect(byRow(bom, 3)).toMatchObject({ status: 'ok', risk: '' });
    expect(byRow(bom, 5)).toMatchObject({ status: 'at-risk', risk: 'Last-time buy — no approved equivalent yet' });
    expect(byRow(bom, 7)).toMatchObject({ status: 'confirm', risk: 'Not found exactly: 2 close part numbers to confirm' });
    expect(byRow(bom, 10)).toMatchObject({ status: 'confirm', risk: '2 makers use this number: confirm which' });
    expect(byRow(bom, 9)).toMatchObject({ status: 'at-risk', risk: 'Cadmium cell: check the RoHS exemptions that apply and local rules — no approved equivalent yet' });
    expect(byRow(bom, 9).match.part?.cadmium).toBe(true);
    // Row 10 names U1 again; the problem is kept on both lines.
    expect(byRow(bom, 10).problems).toContainEqual({ field: 'designators', message: 'U1 is also on row 2' });
    expect(byRow(bom, 2).problems).toContainEqual({ field: 'designators', message: 'U1 is also on row 10' });
    expect(bom.summary).toMatchObject({ lines: 9, obsolete: 1, lastTimeBuy: 1, cadmium: 1, nonCompliant: 0, unmatched: 1, toConfirm: 2, withProblems: 3, replaced: 0, ok: 3 });
    expect(bom.summary.text).toBe('9 lines: 1 obsolete, 1 last-time buy, 1 cadmium, 1 not in catalog, 2 to confirm, 3 with line problems');
    expect(bom.checks).toHaveLength(1);
    expect(bom.checks[0]).toMatchObject({ trigger: 'upload', checkedBy: { id: ownerId }, changes: [], summary: bom.summary });
  });

  it('keeps a quantity that is not a number as a problem on its line, with the row', async () => {
    const line = byRow(bom, 5);
    expect(line).toMatchObject({ row: 5, quantity: null, cells: ['OD-10V#PBF', '', 'ten', 'U5', ''] });
    expect(line.problems).toEqual([{ field: 'quantity', message: "Quantity 'ten' is not a number" }]);
  });

  it('confirms a candidate, answers the line, and the detail and list follow', async () => {
    const typo = byRow(bom, 7);
    const res = await owner.patch(`/api/boms/${bom.id}/lines/${typo.id}`).send({ partId: typo.match.candidates[0]!.part.id }).expect(200);
    const line = BomLineDtoSchema.parse(res.body);
    expect(line).toMatchObject({ status: 'at-risk', match: { kind: 'confirmed', part: { id: ids.CV2207 }, candidates: [] } });
    expect(line.match.detail).toMatch(/^Confirmed by /);
    const list = BomListResponseSchema.parse((await owner.get('/api/boms?scope=mine').expect(200)).body);
    expect(list.items.find((b) => b.id === bom.id)?.summary).toMatchObject({ toConfirm: 1, obsolete: 2 });
    // null puts the line back to automatic matching.
    const back = BomLineDtoSchema.parse((await owner.patch(`/api/boms/${bom.id}/lines/${typo.id}`).send({ partId: null }).expect(200)).body);
    expect(back.match.kind).toBe('candidates');
    await owner.patch(`/api/boms/${bom.id}/lines/${typo.id}`).send({ partId: ids.CV2207 }).expect(200);
    const unknown = await owner.patch(`/api/boms/${bom.id}/lines/${typo.id}`).send({ partId: '00000000-0000-4000-8000-00000000abcd' }).expect(422);
    expect(unknown.body.error.code).toBe('unknown_part');
  });

  it('chooses a replacement with a note, keeps who chose it and when, and the risk says so', async () => {
    const line = byRow(bom, 2);
    const chosen = BomLineDtoSchema.parse(
      (await owner.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ replacementPartId: ids.CV2208, replacementNote: 'Approved stand-in, order 50.' }).expect(200)).body,
    );
    expect(chosen).toMatchObject({ status: 'at-risk', risk: 'Obsolete — replaced by Fixture Linear CV2208', replacement: { part: { id: ids.CV2208 }, note: 'Approved stand-in, order 50.', chosenBy: { id: ownerId } } });
    const noteOnly = BomLineDtoSchema.parse((await owner.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ replacementNote: 'Order 60.' }).expect(200)).body);
    expect(noteOnly.replacement).toMatchObject({ note: 'Order 60.', chosenAt: chosen.replacement!.chosenAt });
    const same = await owner.patch(`/api/boms/${bom.id}/lines/${line.id}`).send({ replacementPartId: ids.CV2207 }).expect(422);
    expect(same.body.error.code).toBe('same_part');
    const noReplacement = await owner.patch(`/api/boms/${bom.id}/lines/${byRow(bom, 3).id}`).send({ replacementNote: 'x' }).expect(422);
    expect(noReplacement.body.error.code).toBe('no_replacement');
    const detail = BomDetailDtoSchema.parse((await owner.get(`/api/boms/${bom.id}`).expect(200)).body);
    expect(detail.summary.text).toMatch(/— 1 replacement chosen$/);
  });

  it("lists a line's approved equivalents first, then the engine's alternates without repeating them", async () => {
    const res = await owner.get(`/api/boms/${bom.id}/lines/${byRow(bom, 2).id}/options`).expect(200);
    const options = BomLineOptionsSchema.parse(res.body);
    expect(options.approvedEquivalents.map((e) => e.part.id)).toEqual([ids.CV2208]);
    expect(options.alternates.length).toBeGreaterThan(0);
    expect(options.alternates.length).toBeLessThanOrEqual(BOM_LIMITS.alternatesPerLine);
    expect(options.alternates.map((a) => a.part.id)).not.toContain(ids.CV2208);
    expect(options.alternates.map((a) => a.part.id)).not.toContain(ids.CV2207);
    const unmatched = BomLineOptionsSchema.parse((await owner.get(`/api/boms/${bom.id}/lines/${byRow(bom, 8).id}/options`).expect(200)).body);
    expect(unmatched).toEqual({ approvedEquivalents: [], alternates: [] });
  });

  it('checks again after a part changes: a new check names the lines whose status moved, newest first', async () => {
    const part = await getPart(ctx.db, ids['OD-4558X']!);
    await updatePart(ctx.db, ctx.queue, editorId, part.id, { version: part.version, lifecycle: 'nrnd' });
    const res = await owner.post(`/api/boms/${bom.id}/check`).expect(200);
    const detail = BomDetailDtoSchema.parse(res.body);
    expect(detail.checks.map((c) => c.trigger)).toEqual(['manual', 'upload']);
    const [latest] = detail.checks;
    expect(latest).toMatchObject({ checkedBy: { id: ownerId }, summary: { nrnd: 2 } });
    // Row 7 moved too since the last check: the owner confirmed it as the obsolete CV2207.
    expect(latest!.changes).toEqual([
      'Row 3, OD 4558X: OK → At risk (Not recommended for new designs — no approved equivalent yet)',
      'Row 4, OD4558X-TR: OK → At risk (Not recommended for new designs — no approved equivalent yet)',
      'Row 7, CV2270: Confirm match → At risk (Obsolete — 1 approved equivalent)',
    ]);
    expect(byRow(detail, 3).status).toBe('at-risk');
    // The confirmed line stays as the user confirmed it.
    expect(byRow(detail, 7).match.kind).toBe('confirmed');

    // A catalog part added since turns a line that was not in the catalog into a match; the alerts call this with 'change'.
    const added = await createPart(ctx.db, null, PartCreateBodySchema.parse({ family: 'op-amp', manufacturer: 'Quillon Semiconductor', partNumber: 'ZZ-NOPE-9' }));
    const check = await recheckBom(ctx.db, bom.id, { trigger: 'change', actorId: null });
    expect(check).toMatchObject({ trigger: 'change', checkedBy: null });
    expect(check.changes).toEqual(['Row 8, ZZ-NOPE-9: Not in catalog → OK']);
    const after = BomDetailDtoSchema.parse((await owner.get(`/api/boms/${bom.id}`).expect(200)).body);
    expect(byRow(after, 8).match).toMatchObject({ kind: 'exact', part: { id: added.id } });
    expect(after.checks.map((c) => c.trigger)).toEqual(['change', 'manual', 'upload']);
  });

  it('exports CSV: the original header and cells untouched, the added columns, a byte order mark, an attachment', async () => {
    const res = await owner.get(`/api/boms/${bom.id}/export.csv`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="Fuzz v2 rev B - checked.csv"');
    const raw = res.body as Buffer;
    expect([...raw.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const parsed = Papa.parse<string[]>(raw.toString('utf8').slice(1), { delimiter: ';', skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual(['Part Number', 'Manufacturer', 'Qty', 'Designator', 'Notes', ...BOM_EXPORT_COLUMNS]);
    const original = Papa.parse<string[]>(MESSY, { delimiter: ';', skipEmptyLines: true }).data.slice(1);
    expect(rows.map((r) => r.slice(0, 5))).toEqual(original);
    const first = rows[0]!.slice(5);
    expect(first).toEqual(['At risk', 'Fixture Linear CV2207', 'Obsolete', 'RoHS compliant', 'Obsolete — replaced by Fixture Linear CV2208', 'Fixture Linear CV2208', 'Order 60.']);
    expect(rows[6]!.slice(5, 7)).toEqual(['At risk', 'Oddfellow Devices OD-LDR5']);
  });

  it('remembers the mapping for the next file, by header text and by position', async () => {
    const next = BomPreviewSchema.parse((await owner.post('/api/boms/preview').send({ text: 'designator;PART NUMBER;qty\nU1;CV2207;1\n' }).expect(200)).body);
    expect(next.mapping).toEqual({ partNumber: 1, quantity: 2, designators: 0 });
    expect(next.mappingSource).toEqual({ partNumber: 'remembered', quantity: 'remembered', designators: 'remembered' });
    const headerless = BomPreviewSchema.parse((await owner.post('/api/boms/preview').send({ text: 'CV2207;x;1;U1;n\n', hasHeader: false }).expect(200)).body);
    expect(headerless.mapping).toMatchObject({ partNumber: 0, manufacturer: 1, quantity: 2, designators: 3, notes: 4 });
    expect(headerless.mappingSource.partNumber).toBe('remembered');
  });
});

describe('BOM rejections', () => {
  const rejected = async (over: Partial<BomCreateBody>, status = 400) => (await owner.post('/api/boms').send(body(over)).expect(status)).body;

  it('refuses an empty BOM, a header without lines, a missing part-number column and a column without part numbers', async () => {
    expect(await rejected({ text: '' })).toMatchObject({ error: { code: 'bom_empty' }, details: { reason: 'empty' } });
    expect(await rejected({ text: 'Part Number;Qty\n' })).toMatchObject({ details: { reason: 'empty' } });
    expect(await rejected({ mapping: { partNumber: 9 } })).toMatchObject({ error: { code: 'bom_no_part_number_column' }, details: { reason: 'no-part-number-column' } });
    expect(await rejected({ mapping: { partNumber: 4 }, text: 'a;b;c;d;e\nx;y;z;w;\n' })).toMatchObject({ error: { code: 'bom_no_part_numbers' }, details: { reason: 'no-part-numbers' } });
  });

  it('refuses an unclosed quote with its row, and a text over the size limit (413)', async () => {
    expect(await rejected({ text: 'MPN;Notes\nCV2207;"never closed\nOD-10V;x\n' })).toMatchObject({ details: { reason: 'unreadable', rows: [{ row: 2 }] } });
    const huge = await rejected({ text: 'x'.repeat(BOM_LIMITS.maxBytes + 1) }, 413);
    expect(huge).toMatchObject({ error: { code: 'bom_too_large' }, details: { reason: 'too-large' } });
  });

  it('accepts 10,000 lines and refuses 10,001, saying how many it found', async () => {
    const lines = (n: number) => ['MPN;Qty;Ref', ...Array.from({ length: n }, (_, i) => `CV2208;1;R${i + 1}`)].join('\n');
    const tooMany = await rejected({ text: lines(BOM_LIMITS.maxLines + 1) });
    expect(tooMany).toMatchObject({ error: { code: 'bom_too_many_lines' }, details: { reason: 'too-many-lines' } });
    expect(tooMany.error.message).toContain('Found 10,001 lines');
    const res = await owner.post('/api/boms').send(body({ text: lines(BOM_LIMITS.maxLines), mapping: { partNumber: 0, quantity: 1, designators: 2 } })).expect(201);
    expect(res.body.lineCount).toBe(BOM_LIMITS.maxLines);
    expect(res.body.summary.text).toBe('10,000 lines, all OK');
    await owner.delete(`/api/boms/${res.body.id}`).expect(204);
  });

  it('answers 400 naming the field for a body that is not a BOM', async () => {
    const res = await owner.post('/api/boms').send({ name: ' ', text: 'x', delimiter: ':', hasHeader: 'yes', mapping: {} }).expect(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(['body.name', 'body.delimiter', 'body.hasHeader', 'body.mapping.partNumber']));
  });
});

describe('BOM ownership and sharing', () => {
  let bom: BomDetailDto;
  let lineId: string;

  beforeAll(async () => {
    bom = await create(owner, { name: 'Tremolo' });
    lineId = bom.lines[0]!.id;
  });

  it("hides one viewer's BOM from another: absent from their lists, 404 on every route", async () => {
    const list = BomListResponseSchema.parse((await otherViewer.get('/api/boms').expect(200)).body);
    expect(list.items.map((b) => b.id)).not.toContain(bom.id);
    await otherViewer.get(`/api/boms/${bom.id}`).expect(404);
    await otherViewer.patch(`/api/boms/${bom.id}`).send({ name: 'Mine now' }).expect(404);
    await otherViewer.delete(`/api/boms/${bom.id}`).expect(404);
    await otherViewer.post(`/api/boms/${bom.id}/check`).expect(404);
    await otherViewer.put(`/api/boms/${bom.id}/shares`).send({ userIds: [] }).expect(404);
    await otherViewer.patch(`/api/boms/${bom.id}/lines/${lineId}`).send({ partId: null }).expect(404);
    await otherViewer.get(`/api/boms/${bom.id}/lines/${lineId}/options`).expect(404);
    await otherViewer.get(`/api/boms/${bom.id}/export.csv`).expect(404);
  });

  it('shares read-only: the colleague reads and exports it, but may not change, check or share it (403)', async () => {
    const colleagues = (await owner.get('/api/boms/colleagues').expect(200)).body.items as { id: string; email: string }[];
    expect(colleagues.map((c) => c.id)).toContain(otherViewerId);
    expect(colleagues.map((c) => c.id)).not.toContain(ownerId);

    const shared = BomDetailDtoSchema.parse((await owner.put(`/api/boms/${bom.id}/shares`).send({ userIds: [otherViewerId, otherViewerId] }).expect(200)).body);
    expect(shared.sharedWith.map((p) => p.id)).toEqual([otherViewerId]);

    const sharedList = BomListResponseSchema.parse((await otherViewer.get('/api/boms?scope=shared').expect(200)).body);
    expect(sharedList.items.map((b) => b.id)).toEqual([bom.id]);
    expect((await otherViewer.get('/api/boms?scope=mine').expect(200)).body.items).toEqual([]);
    await otherViewer.get(`/api/boms/${bom.id}`).expect(200);
    await otherViewer.get(`/api/boms/${bom.id}/lines/${lineId}/options`).expect(200);
    await otherViewer.get(`/api/boms/${bom.id}/export.csv`).expect(200);
    await otherViewer.patch(`/api/boms/${bom.id}`).send({ watched: false }).expect(403);
    await otherViewer.post(`/api/boms/${bom.id}/check`).expect(403);
    await otherViewer.patch(`/api/boms/${bom.id}/lines/${lineId}`).send({ partId: null }).expect(403);
    await otherViewer.put(`/api/boms/${bom.id}/shares`).send({ userIds: [] }).expect(403);
    await otherViewer.delete(`/api/boms/${bom.id}`).expect(403);
  });

  it('lets editors read every BOM but not change one that is not theirs', async () => {
    const all = BomListResponseSchema.parse((await editor.get('/api/boms?scope=all').expect(200)).body);
    expect(all.items.map((b) => b.id)).toContain(bom.id);
    expect((await editor.get('/api/boms?scope=mine').expect(200)).body.items).toEqual([]);
    await editor.get(`/api/boms/${bom.id}`).expect(200);
    await editor.patch(`/api/boms/${bom.id}`).send({ name: 'x' }).expect(403);
    await editor.post(`/api/boms/${bom.id}/check`).expect(403);
  });

  it('shares only with active people other than the owner, and the owner renames, unwatches and deletes', async () => {
    expect((await owner.put(`/api/boms/${bom.id}/shares`).send({ userIds: [ownerId] }).expect(422)).body.error.code).toBe('share_with_owner');
    const gone = await createUser(ctx.db, { disabled: true });
    expect((await owner.put(`/api/boms/${bom.id}/shares`).send({ userIds: [gone.id] }).expect(422)).body.error.code).toBe('unknown_user');
    const colleagues = (await owner.get('/api/boms/colleagues').expect(200)).body.items as { id: string }[];
    expect(colleagues.map((c) => c.id)).not.toContain(gone.id);

    const renamed = (await owner.patch(`/api/boms/${bom.id}`).send({ name: 'Tremolo rev C', watched: false }).expect(200)).body;
    expect(renamed).toMatchObject({ name: 'Tremolo rev C', watched: false, sharedWith: [{ id: otherViewerId }] });
    const unshared = BomDetailDtoSchema.parse((await owner.put(`/api/boms/${bom.id}/shares`).send({ userIds: [] }).expect(200)).body);
    expect(unshared.sharedWith).toEqual([]);
    await otherViewer.get(`/api/boms/${bom.id}`).expect(404);
    await owner.delete(`/api/boms/${bom.id}`).expect(204);
    await owner.get(`/api/boms/${bom.id}`).expect(404);
  });
});

describe('similarity search', () => {
  it('gives the same candidates in memory as pg_trgm does in PostgreSQL', async () => {
    // Source: PostgreSQL's own similarity() is the reference the in-memory search must reproduce.
    const keys = ['cv2270', 'od4585x', 'qx10', 'odldr', 'od10', 'zzzz', 'cv22o8'].map(partNumberKey);
    const sql = await nearestParts(ctx.db, keys, { inMemory: false });
    const memory = await nearestParts(ctx.db, keys, { inMemory: true });
    const round = (m: Map<string, { partId: string; similarity: number }[]>) =>
      Object.fromEntries([...m].map(([k, list]) => [k, list.map((c) => ({ partId: c.partId, similarity: Math.round(c.similarity * 1e5) / 1e5 }))]));
    expect(round(memory)).toEqual(round(sql));
    expect(sql.get('cv2270')?.[0]?.partId).toBe(ids.CV2207);
  });
});
