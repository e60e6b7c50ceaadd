import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Datasheets1764806400000 implements MigrationInterface {
  name = 'Datasheets1764806400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE datasheets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        sha256 char(64) NOT NULL,
        file_name varchar(255) NOT NULL,
        byte_size int NOT NULL CHECK (byte_size > 0),
        page_count int NOT NULL CHECK (page_count > 0),
        storage_key varchar(200) NOT NULL,
        status varchar(16) NOT NULL CHECK (status IN ('queued', 'parsing', 'ready', 'applied', 'failed')),
        failure_reason text,
        extraction jsonb,
        -- Archiving a part keeps its datasheets; only a hard delete (never done by the app) unlinks them.
        part_id uuid REFERENCES parts(id) ON DELETE SET NULL,
        uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        parsed_at timestamptz,
        applied_at timestamptz
      )`);
    await q.query(`CREATE UNIQUE INDEX datasheets_sha256_key ON datasheets (sha256)`);
    await q.query(`CREATE INDEX datasheets_part_idx ON datasheets (part_id, created_at DESC)`);
    await q.query(`CREATE INDEX datasheets_created_idx ON datasheets (created_at DESC)`);
    await q.query(`ALTER TABLE part_revisions ADD COLUMN datasheet_id uuid REFERENCES datasheets(id) ON DELETE SET NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE part_revisions DROP COLUMN datasheet_id`);
    await q.query(`DROP TABLE datasheets`);
  }
}
