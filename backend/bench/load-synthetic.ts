import type { DataSource } from 'typeorm';
import { partNumberKey, PartCreateBodySchema, PIN_LAYOUTS } from '@understudy/shared-types';
import { generateSyntheticParts } from '@understudy/seed/src/generate-catalog';

/**
 * Loads N synthetic parts straight into the tables in batches (one INSERT … SELECT from a JSON array each),
 * skipping per-part revisions: this is benchmark data, not a catalog anyone edits.
 */
export async function loadSyntheticCatalog(db: DataSource, n: number, log: (line: string) => void): Promise<void> {
  await db.query('TRUNCATE part_revisions, parts, manufacturers CASCADE');
  const manufacturerIds = new Map<string, string>();
  const batchSize = 2_000;
  let batch: Record<string, unknown>[] = [];
  let loaded = 0;
  const started = Date.now();

  const flush = async () => {
    if (!batch.length) return;
    await db.query(
      `INSERT INTO parts (family, manufacturer_id, part_number, part_number_key, description, lifecycle, rohs_status, rohs_note, package, pin_layout, pin_map, parameters, tags)
       SELECT family, manufacturer_id, part_number, part_number_key, description, lifecycle, rohs_status, rohs_note, package, pin_layout, pin_map, parameters, tags
         FROM jsonb_to_recordset($1::jsonb) AS x(family text, manufacturer_id uuid, part_number text, part_number_key text, description text, lifecycle text,
              rohs_status text, rohs_note text, package text, pin_layout text, pin_map jsonb, parameters jsonb, tags text[])
       ON CONFLICT DO NOTHING`,
      [JSON.stringify(batch)],
    );
    loaded += batch.length;
    batch = [];
    if (loaded % 20_000 === 0) log(`  loaded ${loaded.toLocaleString('en')} parts (${((Date.now() - started) / 1000).toFixed(1)} s)`);
  };

  for (const raw of generateSyntheticParts(n, 1)) {
    const part = PartCreateBodySchema.parse(raw);
    let manufacturerId = manufacturerIds.get(part.manufacturer);
    if (!manufacturerId) {
      const [row] = await db.query(`INSERT INTO manufacturers (name) VALUES ($1) RETURNING id`, [part.manufacturer]);
      manufacturerId = row.id as string;
      manufacturerIds.set(part.manufacturer, manufacturerId);
    }
    const layout = part.pinLayout ? (PIN_LAYOUTS as Record<string, { pins: Record<number, string> }>)[part.pinLayout] : undefined;
    batch.push({
      family: part.family,
      manufacturer_id: manufacturerId,
      part_number: part.partNumber,
      part_number_key: partNumberKey(part.partNumber),
      description: part.description,
      lifecycle: part.lifecycle,
      rohs_status: part.rohsStatus,
      rohs_note: part.rohsNote,
      package: part.package,
      pin_layout: part.pinLayout,
      pin_map: Object.keys(part.pinMap).length ? part.pinMap : (layout?.pins ?? {}),
      parameters: part.parameters,
      tags: `{${part.tags.map((t) => `"${t.replace(/"/g, '')}"`).join(',')}}`,
    });
    if (batch.length >= batchSize) await flush();
  }
  await flush();
  // VACUUM sets the visibility map, so paging can read ids from the index alone.
  await db.query('VACUUM ANALYZE parts');
  await db.query('ANALYZE manufacturers');
  log(`  ${loaded.toLocaleString('en')} parts loaded in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}
