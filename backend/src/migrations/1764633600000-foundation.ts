import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1764633600000 implements MigrationInterface {
  name = 'Foundation1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS pgcrypto`);
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email varchar(254) NOT NULL,
        name varchar(120) NOT NULL,
        password_hash varchar(255) NOT NULL,
        role varchar(16) NOT NULL CHECK (role IN ('viewer', 'editor', 'admin')),
        disabled boolean NOT NULL DEFAULT false,
        last_sign_in_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX users_email_lower_key ON users (lower(email))`);

    await q.query(`
      CREATE TABLE invitations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email varchar(254) NOT NULL,
        role varchar(16) NOT NULL CHECK (role IN ('viewer', 'editor', 'admin')),
        token_hash char(64) NOT NULL UNIQUE,
        invited_by_id uuid REFERENCES users(id) ON DELETE SET NULL,
        expires_at timestamptz NOT NULL,
        accepted_at timestamptz,
        revoked_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX invitations_email_lower_idx ON invitations (lower(email))`);

    await q.query(`
      CREATE TABLE password_resets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        token_hash char(64) NOT NULL UNIQUE,
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX password_resets_user_idx ON password_resets (user_id)`);

    await q.query(`
      CREATE TABLE audit_events (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        actor_id uuid REFERENCES users(id) ON DELETE SET NULL,
        action varchar(64) NOT NULL,
        subject_type varchar(32) NOT NULL,
        subject_id varchar(64),
        before jsonb,
        after jsonb,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX audit_events_subject_idx ON audit_events (subject_type, subject_id, created_at DESC)`);
    await q.query(`CREATE INDEX audit_events_created_idx ON audit_events (created_at DESC)`);

    // The session table connect-pg-simple expects.
    await q.query(`
      CREATE TABLE sessions (
        sid varchar NOT NULL PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX sessions_expire_idx ON sessions (expire)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE sessions`);
    await q.query(`DROP TABLE audit_events`);
    await q.query(`DROP TABLE password_resets`);
    await q.query(`DROP TABLE invitations`);
    await q.query(`DROP TABLE users`);
  }
}
