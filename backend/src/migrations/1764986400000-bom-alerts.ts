import type { MigrationInterface, QueryRunner } from 'typeorm';
import { ALERT_DELIVERIES, PART_CHANGE_KINDS } from '@understudy/shared-types';

const list = (values: readonly string[]) => values.map((v) => `'${v}'`).join(', ');

/** Watch and alert: part changes, one notice per person and change, and each person's delivery preference. */
export class BomAlerts1764986400000 implements MigrationInterface {
  name = 'BomAlerts1764986400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE part_changes (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        part_id uuid NOT NULL REFERENCES parts(id) ON DELETE CASCADE,
        kind varchar(32) NOT NULL CHECK (kind IN (${list(PART_CHANGE_KINDS)})),
        before jsonb,
        after jsonb,
        equivalent_id uuid REFERENCES equivalents(id) ON DELETE SET NULL,
        actor_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX part_changes_part_idx ON part_changes (part_id, created_at DESC)`);

    await q.query(`
      CREATE TABLE notifications (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        change_id uuid NOT NULL REFERENCES part_changes(id) ON DELETE CASCADE,
        title varchar(300) NOT NULL,
        body text NOT NULL,
        boms jsonb NOT NULL DEFAULT '[]',
        read_at timestamptz,
        emailed_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        -- A repeated fan-out of the same change inserts nothing, so it mails nothing.
        UNIQUE (user_id, change_id)
      )`);
    await q.query(`CREATE INDEX notifications_user_idx ON notifications (user_id, created_at DESC)`);
    // The digest's work list: notices neither mailed nor already read in the app.
    await q.query(`CREATE INDEX notifications_unsent_idx ON notifications (user_id) WHERE emailed_at IS NULL AND read_at IS NULL`);
    await q.query(`CREATE INDEX notifications_change_idx ON notifications (change_id)`);

    await q.query(`
      CREATE TABLE alert_preferences (
        user_id uuid PRIMARY KEY REFERENCES users(id) ON DELETE CASCADE,
        delivery varchar(16) NOT NULL CHECK (delivery IN (${list(ALERT_DELIVERIES)})),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE alert_preferences`);
    await q.query(`DROP TABLE notifications`);
    await q.query(`DROP TABLE part_changes`);
  }
}
