import { createDataSource } from '../data-source';

const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set');
  process.exit(1);
}
const dataSource = createDataSource(url);
await dataSource.initialize();
const applied = await dataSource.runMigrations({ transaction: 'each' });
console.log(applied.length ? `Applied ${applied.map((m) => m.name).join(', ')}` : 'Database schema is up to date');
await dataSource.destroy();
