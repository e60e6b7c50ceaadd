import type { DataSource } from 'typeorm';
import { BomEntity, BomLineEntity, BomShareEntity } from '../../entities';

/**
 * A saved BOM straight into the tables, for the alert tests: each entry of `lines` is a line matched to that part,
 * or `{ partId, replacementPartId }` for a line with a chosen replacement.
 */
export async function insertBom(
  db: DataSource,
  input: { ownerId: string; name: string; watched?: boolean; lines: (string | { partId: string | null; replacementPartId: string })[]; sharedWith?: string[] },
): Promise<string> {
  const boms = db.getRepository(BomEntity);
  const bom = await boms.save(
    boms.create({
      ownerId: input.ownerId,
      name: input.name,
      fileName: null,
      encoding: 'text',
      delimiter: ',',
      hasHeader: true,
      columns: ['Part number'],
      mapping: { partNumber: 0 },
      watched: input.watched ?? true,
      lineCount: input.lines.length,
      summary: null,
      lastCheckedAt: null,
    }),
  );
  const partNumbers = new Map<string, string>(
    ((await db.query(`SELECT id, part_number FROM parts`)) as { id: string; part_number: string }[]).map((p) => [p.id, p.part_number]),
  );
  const lines = db.getRepository(BomLineEntity);
  await lines.save(
    input.lines.map((line, i) => {
      const { partId, replacementPartId } = typeof line === 'string' ? { partId: line, replacementPartId: null } : line;
      const partNumber = partId ? (partNumbers.get(partId) ?? '') : 'UNKNOWN-1';
      return lines.create({
        bomId: bom.id,
        position: i,
        rowNumber: i + 2,
        cells: [partNumber],
        partNumber,
        partNumberKey: partNumber.toUpperCase().replace(/[\s-]/g, ''),
        manufacturer: null,
        quantity: 1,
        designators: [],
        notes: '',
        problems: [],
        // Confirmed, so a check of the BOM keeps the part the test put on the line.
        matchKind: partId ? 'confirmed' : 'unmatched',
        partId,
        matchDetail: null,
        candidates: [],
        replacementPartId,
        replacementNote: '',
        replacementChosenById: replacementPartId ? input.ownerId : null,
        replacementChosenAt: replacementPartId ? new Date() : null,
      });
    }),
  );
  if (input.sharedWith?.length) await db.getRepository(BomShareEntity).insert(input.sharedWith.map((userId) => ({ bomId: bom.id, userId })));
  return bom.id;
}
