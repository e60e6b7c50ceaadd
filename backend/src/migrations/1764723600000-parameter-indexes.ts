import type { MigrationInterface, QueryRunner } from 'typeorm';
import { parameterIndexStatements } from '../modules/parts/parameter-index-sql';

/**
 * Expression indexes on the JSONB parameter values the search filters by, built from the shared parameter
 * definitions. A parameter added to the definitions later needs a migration of its own that indexes it.
 */
export class ParameterIndexes1764723600000 implements MigrationInterface {
  name = 'ParameterIndexes1764723600000';

  async up(q: QueryRunner): Promise<void> {
    for (const { name, sql } of parameterIndexStatements()) await q.query(`CREATE INDEX IF NOT EXISTS ${name} ${sql}`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const { name } of parameterIndexStatements()) await q.query(`DROP INDEX IF EXISTS ${name}`);
  }
}
