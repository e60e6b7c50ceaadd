import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PartsCatalog1764720000000 implements MigrationInterface {
  name = 'PartsCatalog1764720000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pg_trgm`);
    await q.query(`
      CREATE TABLE manufacturers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name varchar(120) NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX manufacturers_name_lower_key ON manufacturers (lower(name))`);
    await q.query(`CREATE INDEX manufacturers_name_trgm_idx ON manufacturers USING gin (lower(name) gin_trgm_ops)`);

    await q.query(`
      CREATE TABLE parts (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        family varchar(24) NOT NULL CHECK (family IN ('op-amp', 'photoresistor', 'led', 'potentiometer', 'optocoupler')),
        manufacturer_id uuid NOT NULL REFERENCES manufacturers(id),
        part_number varchar(64) NOT NULL,
        part_number_key varchar(64) NOT NULL,
        description text NOT NULL DEFAULT '',
        lifecycle varchar(16) NOT NULL CHECK (lifecycle IN ('active', 'nrnd', 'last-time-buy', 'obsolete')),
        rohs_status varchar(16) NOT NULL CHECK (rohs_status IN ('compliant', 'exempt', 'non-compliant', 'unknown')),
        rohs_note text NOT NULL DEFAULT '',
        package varchar(40) NOT NULL DEFAULT '',
        pin_layout varchar(48),
        pin_map jsonb NOT NULL DEFAULT '{}',
        parameters jsonb NOT NULL DEFAULT '{}',
        tags text[] NOT NULL DEFAULT '{}',
        version int NOT NULL DEFAULT 1,
        archived boolean NOT NULL DEFAULT false,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        search_tsv tsvector GENERATED ALWAYS AS (
          to_tsvector('simple', part_number || ' ' || coalesce(description, ''))
        ) STORED
      )`);
    await q.query(`CREATE UNIQUE INDEX parts_manufacturer_pn_key ON parts (manufacturer_id, part_number_key)`);
    await q.query(`CREATE INDEX parts_family_idx ON parts (family, part_number_key) WHERE NOT archived`);
    await q.query(`CREATE INDEX parts_pn_trgm_idx ON parts USING gin (part_number_key gin_trgm_ops)`);
    await q.query(`CREATE INDEX parts_search_tsv_idx ON parts USING gin (search_tsv)`);
    // Parametric filters read the JSONB document; jsonb_path_ops keeps containment (enum/boolean) filters fast.
    await q.query(`CREATE INDEX parts_parameters_idx ON parts USING gin (parameters jsonb_path_ops)`);

    await q.query(`
      CREATE TABLE part_revisions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        part_id uuid NOT NULL REFERENCES parts(id) ON DELETE CASCADE,
        version int NOT NULL,
        actor_id uuid REFERENCES users(id) ON DELETE SET NULL,
        source varchar(80) NOT NULL,
        changes jsonb NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX part_revisions_part_idx ON part_revisions (part_id, version DESC)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE part_revisions`);
    await q.query(`DROP TABLE parts`);
    await q.query(`DROP TABLE manufacturers`);
  }
}
