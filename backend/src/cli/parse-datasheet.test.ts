import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { DatasheetSummarySchema } from '@understudy/shared-types';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makePdf } from '../modules/datasheets/extraction/test-support/make-pdf';

const script = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../scripts/parse-datasheet.mjs');

function run(args: string[], cwd: string): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    // npm sets INIT_CWD to where it was started; the script resolves FILE against it.
    execFile(process.execPath, [script, ...args], { env: { ...process.env, INIT_CWD: cwd }, timeout: 30_000 }, (err, stdout, stderr) => {
      resolve({ code: err ? ((err as { code?: number }).code ?? 1) : 0, stdout, stderr });
    });
  });
}

describe('parse-datasheet CLI', () => {
  let dir: string;
  beforeAll(async () => {
    dir = await mkdtemp(path.join(tmpdir(), 'parse-datasheet-'));
    const texts = [
      { text: 'QX4102', x: 50, y: 50, size: 24 },
      { text: 'Dual operational amplifier', x: 50, y: 84, size: 12 },
      { text: 'Parameter', x: 50, y: 140, size: 8 },
      { text: 'Typ', x: 300, y: 140, size: 8 },
      { text: 'Unit', x: 350, y: 140, size: 8 },
      { text: 'Slew rate', x: 50, y: 154, size: 8 },
      { text: '9', x: 300, y: 154, size: 8 },
      { text: 'V/µs', x: 350, y: 154, size: 8 },
    ];
    await writeFile(path.join(dir, 'good.pdf'), await makePdf([{ texts }]));
    await writeFile(path.join(dir, 'report.pdf'), await makePdf([{ texts }], { userPassword: 'secret' }));
  });
  afterAll(() => rm(dir, { recursive: true, force: true }));

  it('prints exactly one JSON summary line for a relative path', async () => {
    const { code, stdout, stderr } = await run(['good.pdf'], dir);
    expect(code).toBe(0);
    expect(stdout.endsWith('\n')).toBe(true);
    expect(stdout.trimEnd().split('\n')).toHaveLength(1);
    const summary = DatasheetSummarySchema.parse(JSON.parse(stdout));
    expect(summary.partNumber).toBe('QX4102');
    expect(summary.parameters.slewRate).toEqual({ typ: 9e6, unit: 'V/s' });
    expect(stderr).toBe('');
  });

  it('refuses an encrypted file with one line on stderr and exit code 1', async () => {
    const { code, stdout, stderr } = await run(['report.pdf'], dir);
    expect(code).toBe(1);
    expect(stdout).toBe('');
    expect(stderr).toBe('parse-datasheet: report.pdf is encrypted; remove the password and try again\n');
  });

  it('says when the file is missing', async () => {
    const { code, stderr } = await run(['missing.pdf'], dir);
    expect(code).toBe(1);
    expect(stderr).toBe('parse-datasheet: missing.pdf: no such file\n');
  });

  it('prints usage and exits 2 without an argument', async () => {
    const { code, stderr } = await run([], dir);
    expect(code).toBe(2);
    expect(stderr).toMatch(/^usage: /);
  });
});
