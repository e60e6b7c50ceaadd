import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/**
 * Reads a secret from `file`, creating it with a random value on first use. Hex keeps it safe to
 * embed in a connection URL or a SQL literal. Mode 600: only the invoking user may read it.
 */
export function readOrCreateSecret(file, bytes = 24) {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  try {
    const existing = fs.readFileSync(file, 'utf8').trim();
    if (existing) {
      fs.chmodSync(file, 0o600);
      return existing;
    }
  } catch (err) {
    if (err.code !== 'ENOENT') throw err;
  }
  const value = crypto.randomBytes(bytes).toString('hex');
  fs.writeFileSync(file, `${value}\n`, { mode: 0o600 });
  fs.chmodSync(file, 0o600); // writeFileSync's mode is ignored when the (empty) file already existed
  return value;
}
