import fs from 'node:fs';
import path from 'node:path';
import { step } from './log.mjs';
import { repoRoot } from './paths.mjs';
import { runOrFail } from './proc.mjs';

function mtime(file) {
  try {
    return fs.statSync(file).mtimeMs;
  } catch {
    return null;
  }
}

/**
 * Installs dependencies when node_modules is missing or older than package-lock.json.
 * npm records the installed tree in node_modules/.package-lock.json, so its mtime tells us
 * whether the lock file changed (e.g. after a `git pull`) since the last install.
 */
export async function ensureDependencies() {
  const nodeModules = path.join(repoRoot, 'node_modules');
  const lock = mtime(path.join(repoRoot, 'package-lock.json'));
  const installed = mtime(path.join(nodeModules, '.package-lock.json'));
  const stale = !fs.existsSync(nodeModules) || installed === null || (lock !== null && lock > installed);
  if (!stale) return;
  step('Installing dependencies (npm ci)…');
  await runOrFail('npm ci', 'npm', ['ci', '--no-audit', '--no-fund'], { cwd: repoRoot });
}

/**
 * Resolves a package binary the way `npx` would for an installed package (workspace first,
 * then the hoisted root), but without npx's start-up cost or any chance of fetching from the
 * registry. Returns [command, argsPrefix].
 */
export function bin(name, workspaceDir = repoRoot) {
  for (const dir of [workspaceDir, repoRoot]) {
    const candidate = path.join(dir, 'node_modules', '.bin', name);
    if (fs.existsSync(candidate)) return [candidate, []];
  }
  return ['npx', ['--no', name]];
}

/** Convenience: [command, args] for `<name> ...args` resolved via bin(). */
export function binCommand(name, args, workspaceDir) {
  const [cmd, prefix] = bin(name, workspaceDir);
  return [cmd, [...prefix, ...args]];
}
