import type { MigrationInterface, QueryRunner } from 'typeorm';
import { FAMILY_KEYS } from '@understudy/shared-types';
import { COUNT_PARAMETER } from '../modules/alternates/shortlist-sql';
import { familyColumns } from '../modules/parts/parameter-index-sql';

/** One covering index per family for the alternates shortlist (see modules/alternates/shortlist-sql.ts). */
const shortlistIndex = (family: string) => `parts_${family.replace('-', '_')}_shortlist_idx`;

export class Substitution1764896400000 implements MigrationInterface {
  name = 'Substitution1764896400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE equivalents (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        -- An unordered pair, stored ordered so a ruling made from either side is the same row.
        part_a uuid NOT NULL REFERENCES parts(id) ON DELETE CASCADE,
        part_b uuid NOT NULL REFERENCES parts(id) ON DELETE CASCADE,
        status varchar(16) NOT NULL CHECK (status IN ('approved', 'rejected')),
        use varchar(200) NOT NULL CHECK (btrim(use) <> ''),
        note text NOT NULL DEFAULT '',
        decided_by uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (part_a < part_b)
      )`);
    await q.query(`CREATE UNIQUE INDEX equivalents_pair_use_key ON equivalents (part_a, part_b, lower(use))`);
    // The unique index serves lookups by part_a; this one serves the other side.
    await q.query(`CREATE INDEX equivalents_part_b_idx ON equivalents (part_b)`);

    await q.query(`
      CREATE TABLE requirement_sets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        name varchar(120) NOT NULL,
        design varchar(120) NOT NULL DEFAULT '',
        requirements jsonb NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX requirement_sets_owner_idx ON requirement_sets (owner_id, updated_at DESC)`);
    await q.query(`CREATE INDEX requirement_sets_updated_idx ON requirement_sets (updated_at DESC)`);

    // Ordering a family's candidates by closeness reads every one of them: with the numbers as keys and the few
    // narrow columns it compares as INCLUDEs, that is an index-only scan instead of a pass over the wide rows.
    for (const family of FAMILY_KEYS) {
      // The count the original must match leads, so that equality narrows the scan.
      const columns = familyColumns(family);
      const leading = columns.filter((c) => c.key === COUNT_PARAMETER[family]);
      const names = [...leading, ...columns.filter((c) => !leading.includes(c))].map((c) => c.name);
      await q.query(
        `CREATE INDEX ${shortlistIndex(family)} ON parts (${names.join(', ')})
           INCLUDE (id, part_number_key, lifecycle, rohs_status, pin_layout) WHERE NOT archived AND family = '${family}'`,
      );
    }
  }

  async down(q: QueryRunner): Promise<void> {
    for (const family of FAMILY_KEYS) await q.query(`DROP INDEX IF EXISTS ${shortlistIndex(family)}`);
    await q.query(`DROP TABLE requirement_sets`);
    await q.query(`DROP TABLE equivalents`);
  }
}
