import type { DataSource } from 'typeorm';

/**
 * A saved BOM straight into the tables, for the alert tests: each entry of `lines` is a line matched to that part,
 * or `{ partId, replacementPartId }` for a line with a chosen replacement.
 */
export async function insertBom(
  db: DataSource,
  input: { ownerId: string; name: string; watched?: boolean; lines: (string | { partId: string | null; replacementPartId: string })[]; sharedWith?: string[] },
): Promise<string> {
  const rows: { id: string }[] = await db.query(
    `INSERT INTO boms (owner_id, name, encoding, delimiter, has_header, columns, mapping, watched, line_count)
     VALUES ($1, $2, 'text', ',', true, '["Part number"]', '{"partNumber":0}', $3, $4) RETURNING id`,
    [input.ownerId, input.name, input.watched ?? true, input.lines.length],
  );
  const bomId = rows[0]!.id;
  for (const [i, line] of input.lines.entries()) {
    const { partId, replacementPartId } = typeof line === 'string' ? { partId: line, replacementPartId: null } : line;
    await db.query(
      `INSERT INTO bom_lines (bom_id, position, row_number, cells, match_kind, part_id, replacement_part_id)
       VALUES ($1, $2, $3, '[]', $4, $5, $6)`,
      [bomId, i, i + 2, partId ? 'exact' : 'unmatched', partId, replacementPartId],
    );
  }
  for (const userId of input.sharedWith ?? []) await db.query(`INSERT INTO bom_shares (bom_id, user_id) VALUES ($1, $2)`, [bomId, userId]);
  return bomId;
}
