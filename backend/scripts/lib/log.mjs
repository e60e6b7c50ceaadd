// Console helpers shared by the start/test/dev scripts. Built-ins only: these run before `npm ci`.

const useColor = Boolean(process.stdout.isTTY) && !process.env.NO_COLOR;
const paint = (code) => (text) => (useColor ? `\x1b[${code}m${text}\x1b[0m` : String(text));

export const bold = paint('1');
export const dim = paint('2');
export const red = paint('31');
export const green = paint('32');
export const yellow = paint('33');
export const cyan = paint('36');

/** One line per bootstrap step, so a slow step is easy to spot. */
export function step(message) {
  console.log(`${cyan('•')} ${message}`);
}

export function note(message) {
  console.log(`  ${dim(message)}`);
}

export function warn(message) {
  console.warn(`${yellow('!')} ${message}`);
}

export function errorLine(message) {
  console.error(`${red('✖')} ${message}`);
}

/** An expected failure with a message meant for the user: printed without a stack trace. */
export class UserError extends Error {
  constructor(message, { exitCode = 1 } = {}) {
    super(message);
    this.name = 'UserError';
    this.exitCode = exitCode;
  }
}

export function formatDuration(ms) {
  if (ms < 1000) return `${Math.round(ms)} ms`;
  const s = ms / 1000;
  if (s < 60) return `${s.toFixed(1)} s`;
  return `${Math.floor(s / 60)} min ${Math.round(s % 60)} s`;
}
