import { DataSource } from 'typeorm';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

export function createDataSource(databaseUrl: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url: databaseUrl,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    synchronize: false,
    migrationsRun: false,
    logging: ['error', 'warn'],
    extra: {
      max: 10,
      // Fail fast while PostgreSQL is down so /api/health can answer 503 instead of hanging.
      connectionTimeoutMillis: 3_000,
      idleTimeoutMillis: 30_000,
    },
  });
}
