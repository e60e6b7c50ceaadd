import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** Repository root, derived from this file so the scripts work from any cwd. */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');

// UNDERSTUDY_DATA_DIR lets a second checkout or a test run keep its cluster elsewhere.
// A relative value is taken relative to where the user ran npm (INIT_CWD), not the repo root.
const dataOverride = process.env.UNDERSTUDY_DATA_DIR;
export const dataDir = dataOverride
  ? path.resolve(process.env.INIT_CWD || process.cwd(), dataOverride)
  : path.join(repoRoot, '.data');

export const paths = {
  dataDir,
  pgData: path.join(dataDir, 'postgres'),
  runDir: path.join(dataDir, 'run'),
  pgLog: path.join(dataDir, 'postgres.log'),
  dbPasswordFile: path.join(dataDir, 'db-password'),
  sessionSecretFile: path.join(dataDir, 'session-secret'),
  frontendDist: path.join(repoRoot, 'frontend', 'dist'),
};
