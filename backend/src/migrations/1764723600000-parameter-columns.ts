import type { MigrationInterface, QueryRunner } from 'typeorm';
import { FAMILY_KEYS } from '@understudy/shared-types';
import { allParameterColumns, familyColumns } from '../modules/parts/parameter-index-sql';

/**
 * Generated columns for the filterable numbers, each indexed both ways for sorting, plus one index per family over
 * all of its columns so a count is answered from the index alone. Built from the shared parameter definitions: a
 * parameter added later needs a migration of its own that adds its column.
 */
export class ParameterColumns1764723600000 implements MigrationInterface {
  name = 'ParameterColumns1764723600000';

  async up(q: QueryRunner): Promise<void> {
    const columns = allParameterColumns();
    await q.query(`ALTER TABLE parts ${columns.map((c) => `ADD COLUMN ${c.name} float8 GENERATED ALWAYS AS (${c.expression}) STORED`).join(', ')}`);
    for (const c of columns) {
      await q.query(`CREATE INDEX parts_${c.name}_idx ON parts (${c.name}) WHERE NOT archived`);
      await q.query(`CREATE INDEX parts_${c.name}_desc_idx ON parts (${c.name} DESC NULLS LAST) WHERE NOT archived`);
    }
    for (const family of FAMILY_KEYS) {
      const names = familyColumns(family).map((c) => c.name);
      await q.query(`CREATE INDEX parts_${family.replace('-', '_')}_numbers_idx ON parts (family, ${names.join(', ')}) WHERE NOT archived`);
    }
    // Pages of a family in part-number order, read from the index before the wide rows.
    await q.query(`CREATE INDEX parts_family_pn_id_idx ON parts (family, part_number_key, id) WHERE NOT archived`);
    await q.query(`DROP INDEX IF EXISTS parts_family_idx`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`CREATE INDEX IF NOT EXISTS parts_family_idx ON parts (family, part_number_key) WHERE NOT archived`);
    await q.query(`DROP INDEX IF EXISTS parts_family_pn_id_idx`);
    await q.query(`ALTER TABLE parts ${allParameterColumns().map((c) => `DROP COLUMN ${c.name}`).join(', ')}`);
  }
}
