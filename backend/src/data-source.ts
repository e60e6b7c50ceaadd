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
      // Trigram matches below this similarity are noise; the index then hands back far fewer rows to check.
      // 0.38 still catches one slipped character in a six-character part number (similarity 0.4).
      options: '-c pg_trgm.similarity_threshold=0.38',
    },
  });
}
