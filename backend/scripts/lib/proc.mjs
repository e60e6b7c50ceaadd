// Child-process bookkeeping and orderly shutdown.
//
// Every child is spawned `detached` (its own session and process group) with stdin ignored:
//  - a terminal Ctrl-C reaches only this script, so we decide the stop order
//    (children first, then PostgreSQL) instead of everything dying at once;
//  - killing the group also takes down grandchildren (npx → tsx → node, npm → sh → vite);
//  - no child can block on reading the terminal.
import { spawn } from 'node:child_process';
import { errorLine, UserError, warn } from './log.mjs';

const live = new Set(); // handles of children that have not exited yet
const hooks = []; // async cleanup steps, run last-registered-first during shutdown
const finalizers = []; // sync steps run after all cleanup, just before exiting (e.g. a summary)
const exitHooks = []; // sync last resort if the process exits without a proper shutdown

let shutdownPromise = null;
let exitCode = 0;
let forced = false;
let firstSignalAt = 0;

export class ShutdownInProgress extends Error {
  constructor() {
    super('shutting down');
    this.name = 'ShutdownInProgress';
  }
}

export const isShuttingDown = () => shutdownPromise !== null;
export const isForced = () => forced;

/** Registers an async cleanup step. `always` steps still run after a forced (second) Ctrl-C. */
export function onShutdown(fn, { always = false } = {}) {
  hooks.push({ fn, always });
}

export function onFinalize(fn) {
  finalizers.push(fn);
}

/** A synchronous last resort, run from process 'exit' only if shutdown() did not complete. */
export function onExitSync(fn) {
  exitHooks.push(fn);
}

function signalGroup(child, signal) {
  if (!child.pid) return;
  try {
    process.kill(-child.pid, signal); // negative pid: the whole process group
  } catch (err) {
    if (err.code !== 'ESRCH') {
      try {
        child.kill(signal);
      } catch {
        /* already gone */
      }
    }
  }
}

/**
 * Spawns a tracked child. Returns a handle { name, child, exited } where `exited` resolves to
 * { code, signal } (never rejects; a spawn error resolves with code 127).
 * stdout: 'inherit' (default) or 'pipe' (the handle then gets `onLine` callbacks; output is still
 * echoed to our stdout).
 */
export function spawnChild(name, cmd, args, { cwd, env, stdout = 'inherit', onLine } = {}) {
  if (shutdownPromise) throw new ShutdownInProgress();
  const child = spawn(cmd, args, {
    cwd,
    env: env ?? process.env,
    stdio: ['ignore', stdout, 'inherit'],
    detached: true,
  });
  const handle = { name, child, stopping: false };
  live.add(handle);
  handle.exited = new Promise((resolve) => {
    let settled = false;
    const done = (result) => {
      if (settled) return;
      settled = true;
      live.delete(handle);
      handle.result = result;
      resolve(result);
    };
    child.once('error', (err) => {
      errorLine(`${name}: could not run ${cmd}: ${err.message}`);
      done({ code: 127, signal: null });
    });
    child.once('exit', (code, signal) => done({ code, signal }));
  });
  if (stdout === 'pipe') {
    let buffer = '';
    child.stdout.on('data', (chunk) => {
      process.stdout.write(chunk);
      buffer += chunk.toString('utf8');
      let nl;
      while ((nl = buffer.indexOf('\n')) >= 0) {
        const line = buffer.slice(0, nl);
        buffer = buffer.slice(nl + 1);
        onLine?.(line);
      }
    });
  }
  return handle;
}

/**
 * Runs a short command and captures its output. Deliberately untracked and detached: used for
 * pg_ctl/psql, which must be able to finish (e.g. stopping PostgreSQL) while we are shutting down.
 * Resolves { code, stdout, stderr }; a spawn error resolves with code 127.
 */
export function capture(cmd, args, { cwd = '/', env, input } = {}) {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, {
      cwd,
      env: env ?? process.env,
      stdio: [input === undefined ? 'ignore' : 'pipe', 'pipe', 'pipe'],
      detached: true,
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d) => (stdout += d));
    child.stderr.on('data', (d) => (stderr += d));
    child.once('error', (err) => resolve({ code: 127, stdout, stderr: `${stderr}${err.message}` }));
    child.once('close', (code, signal) => resolve({ code: code ?? 128, signal, stdout, stderr }));
    if (input !== undefined) child.stdin.end(input);
  });
}

/**
 * Runs a command to completion with inherited output. Resolves { code, signal, timedOut }.
 * A timeout kills the whole process group, so a hung test run cannot stall CI forever.
 */
export async function run(name, cmd, args, { cwd, env, timeoutMs } = {}) {
  const handle = spawnChild(name, cmd, args, { cwd, env });
  let timer;
  let timedOut = false;
  if (timeoutMs) {
    timer = setTimeout(() => {
      timedOut = true;
      errorLine(`${name} did not finish within ${Math.round(timeoutMs / 1000)} s; stopping it`);
      stopChild(handle, { graceMs: 5000 });
    }, timeoutMs);
  }
  const result = await handle.exited;
  clearTimeout(timer);
  if (shutdownPromise) throw new ShutdownInProgress();
  return { ...result, timedOut };
}

/** Like run(), but a non-zero exit becomes a UserError naming the step. */
export async function runOrFail(name, cmd, args, options) {
  const { code, signal, timedOut } = await run(name, cmd, args, options);
  if (code !== 0) {
    const why = timedOut ? 'timed out' : signal ? `was killed by ${signal}` : `exited with code ${code}`;
    throw new UserError(`${name} failed: ${why}.`);
  }
}

/**
 * Starts a long-running service. `readyPattern` (a RegExp matched against stdout lines) makes
 * `handle.ready` resolve once the service says it is ready; it rejects if the service exits first.
 * `critical` services bring everything down (exit 1) when they die on their own.
 */
export function startService(name, cmd, args, { cwd, env, readyPattern, readyTimeoutMs = 60_000, critical = false } = {}) {
  let markReady;
  let markFailed;
  const ready = new Promise((resolve, reject) => {
    markReady = resolve;
    markFailed = reject;
  });
  ready.catch(() => undefined); // callers that never await `ready` must not trip unhandledRejection
  const handle = spawnChild(name, cmd, args, {
    cwd,
    env,
    stdout: readyPattern ? 'pipe' : 'inherit',
    onLine: (line) => {
      if (readyPattern?.test(line)) markReady();
    },
  });
  handle.ready = ready;
  if (!readyPattern) markReady();
  const timer = setTimeout(
    () => markFailed(new UserError(`${name} did not report ready within ${Math.round(readyTimeoutMs / 1000)} s.`)),
    readyTimeoutMs,
  );
  ready.finally(() => clearTimeout(timer)).catch(() => undefined);
  handle.exited.then(({ code, signal }) => {
    clearTimeout(timer);
    markFailed(new UserError(`${name} exited before it was ready (${signal ?? `code ${code}`}).`));
    if (critical && !handle.stopping && !shutdownPromise) {
      errorLine(`${name} exited unexpectedly (${signal ?? `code ${code}`}); stopping everything.`);
      shutdown(1);
    }
  });
  return handle;
}

/** SIGTERM the child's process group, then SIGKILL whatever is left after `graceMs`. */
export async function stopChild(handle, { graceMs = 8000 } = {}) {
  handle.stopping = true;
  if (!handle.result) {
    signalGroup(handle.child, forced ? 'SIGKILL' : 'SIGTERM');
    let timer;
    const timeout = new Promise((resolve) => {
      timer = setTimeout(resolve, forced ? 1000 : graceMs);
    });
    await Promise.race([handle.exited, timeout]);
    clearTimeout(timer);
  }
  // Also reap grandchildren that outlived the group leader.
  signalGroup(handle.child, 'SIGKILL');
  await Promise.race([handle.exited, new Promise((r) => setTimeout(r, 2000))]);
}

/** Stops every running child (e.g. the servers of one test stage), leaving the cluster alone. */
export async function stopAll(options) {
  await Promise.all([...live].map((handle) => stopChild(handle, options)));
}

function killAllNow() {
  for (const handle of live) signalGroup(handle.child, 'SIGKILL');
}

/**
 * Stops every child, runs the cleanup hooks (PostgreSQL's stop is registered first, so it runs
 * last), runs finalizers, then exits. Idempotent: later calls only raise the exit code.
 */
export function shutdown(code = 0) {
  exitCode = Math.max(exitCode, code);
  if (shutdownPromise) return shutdownPromise;
  shutdownPromise = (async () => {
    await Promise.all([...live].map((handle) => stopChild(handle)));
    for (const { fn, always } of [...hooks].reverse()) {
      if (forced && !always) continue;
      try {
        await fn();
      } catch (err) {
        warn(`cleanup step failed: ${err?.message ?? err}`);
      }
    }
    for (const fn of finalizers) {
      try {
        fn(exitCode);
      } catch (err) {
        warn(`final step failed: ${err?.message ?? err}`);
      }
    }
    exitHooks.length = 0; // everything was cleaned up properly
    process.exit(exitCode);
  })();
  return shutdownPromise;
}

const SIGNAL_NUMBERS = { SIGHUP: 1, SIGINT: 2, SIGTERM: 15 };

/**
 * Ctrl-C / SIGTERM / SIGHUP: first one stops everything in order; a later one kills the children
 * at once but still waits for PostgreSQL to stop cleanly, so it is never left running.
 * `interruptExitCode`: exit code after a signal (default 128 + signal number).
 */
export function installSignalHandlers({ interruptExitCode } = {}) {
  for (const signal of Object.keys(SIGNAL_NUMBERS)) {
    process.on(signal, () => {
      const now = Date.now();
      if (!shutdownPromise) {
        firstSignalAt = now;
        const label = signal === 'SIGINT' ? 'Ctrl-C' : signal;
        console.log(`\n${label} received: stopping everything… (press Ctrl-C again to hurry)`);
        shutdown(interruptExitCode ?? 128 + SIGNAL_NUMBERS[signal]);
        return;
      }
      // `npm run` forwards the terminal's SIGINT to us, so one key press arrives twice.
      if (now - firstSignalAt < 1000) return;
      if (!forced) {
        forced = true;
        console.log('Killing remaining processes; still stopping PostgreSQL cleanly…');
      }
      killAllNow();
    });
  }
  process.on('unhandledRejection', (reason) => {
    if (reason instanceof ShutdownInProgress) return;
    errorLine(`unexpected error: ${reason?.stack ?? reason}`);
    shutdown(1);
  });
  process.on('uncaughtException', (err) => {
    errorLine(`unexpected error: ${err?.stack ?? err}`);
    shutdown(1);
  });
  process.on('exit', () => {
    // Only reached with work left if something called process.exit() directly.
    killAllNow();
    for (const fn of exitHooks) {
      try {
        fn();
      } catch {
        /* best effort */
      }
    }
  });
}

/**
 * Runs a script body: on error prints it (UserError without a stack) and shuts down with exit 1.
 * The body may return normally while services keep running; they hold the event loop open.
 */
export async function main(body) {
  try {
    await body();
  } catch (err) {
    if (err instanceof ShutdownInProgress || shutdownPromise) return;
    if (err instanceof UserError) errorLine(err.message);
    else errorLine(err?.stack ?? String(err));
    await shutdown(err?.exitCode ?? 1);
  }
}

