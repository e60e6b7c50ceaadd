import { defineConfig } from 'vitest/config';

// Pure unit tests (the datasheet parser) without the PostgreSQL global setup the main config needs.
export default defineConfig({
  test: {
    include: ['src/modules/datasheets/extraction/**/*.test.ts', 'src/cli/parse-datasheet.test.ts'],
    environment: 'node',
    testTimeout: 20_000,
  },
});
