// `npm run --silent parse-datasheet -- FILE.pdf`: prints the datasheet summary as one line of JSON on stdout.
// npm runs scripts at the repository root, so FILE is resolved against the directory npm was started in.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { binCommand } from './lib/deps.mjs';
import { repoRoot } from './lib/paths.mjs';

const USAGE = 'usage: npm run --silent parse-datasheet -- FILE.pdf';

const file = process.argv[2];
if (!file || file === '-h' || file === '--help') {
  process.stderr.write(`${USAGE}\n`);
  process.exit(file ? 0 : 2);
}
const absolute = path.resolve(process.env.INIT_CWD || process.cwd(), file);
const backend = path.join(repoRoot, 'backend');
const cli = path.join('src', 'cli', 'parse-datasheet.ts');

/**
 * pdf.js is two 2 MB modules; loaded ahead of tsx they skip its transform hooks, which cuts a run from about 5 s
 * to about 1 s. Without them installed, plain tsx still works.
 */
function command() {
  try {
    const preload = ['pdfjs-dist/legacy/build/pdf.mjs', 'pdfjs-dist/legacy/build/pdf.worker.mjs', 'tsx'].map((s) => import.meta.resolve(s));
    return [process.execPath, [...preload.flatMap((url) => ['--import', url]), cli, absolute]];
  } catch {
    return binCommand('tsx', [cli, absolute], backend);
  }
}

const [cmd, args] = command();
const child = spawn(cmd, args, { cwd: backend, stdio: 'inherit' });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
child.on('error', (err) => {
  process.stderr.write(`parse-datasheet: could not run the parser: ${err.message}\n`);
  process.exit(1);
});
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
