import type { MigrationInterface, QueryRunner } from 'typeorm';
import { parameterIndexStatements } from '../modules/parts/parameter-index-sql';

/** Descending parameter sorts, and an index that finds a deep page's ids without reading the wide rows. */
export class SearchPagingIndexes1764727200000 implements MigrationInterface {
  name = 'SearchPagingIndexes1764727200000';

  async up(q: QueryRunner): Promise<void> {
    for (const { name, sql } of parameterIndexStatements()) await q.query(`CREATE INDEX IF NOT EXISTS ${name} ${sql}`);
    await q.query(`CREATE INDEX IF NOT EXISTS parts_family_pn_id_idx ON parts (family, part_number_key, id) WHERE NOT archived`);
    await q.query(`DROP INDEX IF EXISTS parts_family_idx`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`CREATE INDEX IF NOT EXISTS parts_family_idx ON parts (family, part_number_key) WHERE NOT archived`);
    await q.query(`DROP INDEX IF EXISTS parts_family_pn_id_idx`);
    for (const { name } of parameterIndexStatements().filter((s) => s.name.endsWith('_desc_idx'))) await q.query(`DROP INDEX IF EXISTS ${name}`);
  }
}
