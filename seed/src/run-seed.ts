import { createDataSource } from '@understudy/backend/src/data-source';
import { seedDemoData } from './seed';

if (process.env.NODE_ENV === 'production') {
  console.error('The demo seed never runs in production.');
  process.exit(1);
}
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set');
  process.exit(1);
}
const db = createDataSource(url);
await db.initialize();
const report = await seedDemoData(db);
console.log(
  report.users || report.parts || report.equivalents
    ? `Seeded demo data: ${report.users} demo accounts, ${report.parts} catalog parts, ${report.equivalents} rulings on equivalents`
    : 'Database already has people and parts; demo seed skipped',
);
await db.destroy();
