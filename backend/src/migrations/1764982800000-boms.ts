import type { MigrationInterface, QueryRunner } from 'typeorm';
import { BOM_DELIMITERS, MATCH_KINDS } from '@understudy/shared-types';

// A tab is written as chr(9) so the constraint reads plainly in a schema dump.
const list = (values: readonly string[]) => values.map((v) => (v === '\t' ? 'chr(9)' : `'${v}'`)).join(', ');

/** Bills of materials: the saved files and their lines, checks, shares and each person's remembered mapping. */
export class Boms1764982800000 implements MigrationInterface {
  name = 'Boms1764982800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE boms (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        owner_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        name varchar(120) NOT NULL CHECK (btrim(name) <> ''),
        file_name varchar(255),
        encoding varchar(40) NOT NULL,
        delimiter varchar(1) NOT NULL CHECK (delimiter IN (${list(BOM_DELIMITERS)})),
        has_header boolean NOT NULL,
        columns jsonb NOT NULL,
        mapping jsonb NOT NULL,
        watched boolean NOT NULL DEFAULT true,
        line_count int NOT NULL,
        summary jsonb,
        last_checked_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX boms_owner_idx ON boms (owner_id, updated_at DESC)`);
    await q.query(`CREATE INDEX boms_updated_idx ON boms (updated_at DESC)`);

    await q.query(`
      CREATE TABLE bom_lines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        bom_id uuid NOT NULL REFERENCES boms(id) ON DELETE CASCADE,
        position int NOT NULL,
        row_number int NOT NULL,
        cells jsonb NOT NULL,
        part_number text NOT NULL DEFAULT '',
        part_number_key text NOT NULL DEFAULT '',
        manufacturer text,
        quantity double precision,
        designators jsonb NOT NULL DEFAULT '[]',
        notes text NOT NULL DEFAULT '',
        problems jsonb NOT NULL DEFAULT '[]',
        match_kind varchar(16) NOT NULL CHECK (match_kind IN (${list(MATCH_KINDS)})),
        -- Parts are archived, not deleted; should one go, the line falls back to "not in the catalog".
        part_id uuid REFERENCES parts(id) ON DELETE SET NULL,
        match_detail text,
        candidates jsonb NOT NULL DEFAULT '[]',
        replacement_part_id uuid REFERENCES parts(id) ON DELETE SET NULL,
        replacement_note text NOT NULL DEFAULT '',
        replacement_chosen_by uuid REFERENCES users(id) ON DELETE SET NULL,
        replacement_chosen_at timestamptz,
        updated_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (bom_id, position)
      )`);
    // Which BOMs use a part, for the alerts when it changes.
    await q.query(`CREATE INDEX bom_lines_part_idx ON bom_lines (part_id) WHERE part_id IS NOT NULL`);
    await q.query(`CREATE INDEX bom_lines_replacement_idx ON bom_lines (replacement_part_id) WHERE replacement_part_id IS NOT NULL`);

    await q.query(`
      CREATE TABLE bom_checks (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        bom_id uuid NOT NULL REFERENCES boms(id) ON DELETE CASCADE,
        checked_at timestamptz NOT NULL DEFAULT clock_timestamp(),
        checked_by uuid REFERENCES users(id) ON DELETE SET NULL,
        trigger varchar(8) NOT NULL CHECK (trigger IN ('upload', 'manual', 'change')),
        summary jsonb NOT NULL,
        changes jsonb NOT NULL DEFAULT '[]',
        line_statuses jsonb NOT NULL DEFAULT '[]',
        duration_ms int NOT NULL
      )`);
    await q.query(`CREATE INDEX bom_checks_bom_idx ON bom_checks (bom_id, checked_at DESC)`);

    await q.query(`
      CREATE TABLE bom_shares (
        bom_id uuid NOT NULL REFERENCES boms(id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (bom_id, user_id)
      )`);
    await q.query(`CREATE INDEX bom_shares_user_idx ON bom_shares (user_id)`);

    await q.query(`
      CREATE TABLE bom_mapping_memory (
        user_id uuid PRIMARY KEY REFERENCES users(id) ON DELETE CASCADE,
        by_header jsonb NOT NULL DEFAULT '{}',
        by_index jsonb NOT NULL DEFAULT '{}',
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);

    // A BOM check looks up every distinct part number at once by equality, which the trigram index cannot serve;
    // with the id, maker and number included the lookup never reads the wide rows (an index-only scan).
    await q.query(`CREATE INDEX parts_pn_key_idx ON parts (part_number_key) INCLUDE (id, manufacturer_id, part_number) WHERE NOT archived`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX IF EXISTS parts_pn_key_idx`);
    await q.query(`DROP TABLE bom_mapping_memory`);
    await q.query(`DROP TABLE bom_shares`);
    await q.query(`DROP TABLE bom_checks`);
    await q.query(`DROP TABLE bom_lines`);
    await q.query(`DROP TABLE boms`);
  }
}
