import { createDataSource } from '../src/data-source';

/** Rebuilds the throw-away test database's schema through the real migrations, once per run. */
export default async function setup() {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL is not set; run the backend tests through `npm test`.');
  if (!/_test|_t\b|test_/.test(new URL(url).pathname)) {
    throw new Error(`Refusing to reset ${new URL(url).pathname}: the test database name must contain "test".`);
  }
  const db = createDataSource(url);
  await db.initialize();
  await db.query('DROP SCHEMA IF EXISTS public CASCADE');
  // The job queue keeps its own schema; a fresh run starts with no jobs left from the last.
  await db.query('DROP SCHEMA IF EXISTS pgboss CASCADE');
  await db.query('CREATE SCHEMA public');
  await db.runMigrations({ transaction: 'each' });
  await db.destroy();
}
