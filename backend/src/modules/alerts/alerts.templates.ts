import { LIFECYCLE_LABELS, type Lifecycle, type PartChangeKind } from '@understudy/shared-types';
import type { ApprovedEquivalentChange, NotifiedBom } from '../../entities';
import type { OutgoingMail } from '../../mail/mailer';

/** A part change with the part as it is named now; what every notice and mail about it is written from. */
export interface ChangeFacts {
  kind: PartChangeKind;
  partNumber: string;
  manufacturer: string;
  before: unknown;
  after: unknown;
}

export interface ChangeWords {
  /** "HV4558 is now obsolete" */
  title: string;
  /** What happened, in a sentence or two. */
  detail: string;
  /** What the reader might do about it. */
  advice: string;
}

const AT_RISK: readonly Lifecycle[] = ['obsolete', 'last-time-buy', 'nrnd'];

export function describeChange(change: ChangeFacts): ChangeWords {
  const part = `${change.manufacturer} ${change.partNumber}`;
  if (change.kind === 'lifecycle') {
    const before = change.before as Lifecycle;
    const after = change.after as Lifecycle;
    return {
      title: `${change.partNumber} is now ${LIFECYCLE_LABELS[after].toLowerCase()}`,
      detail: `${part} changed lifecycle: ${LIFECYCLE_LABELS[before]} → ${LIFECYCLE_LABELS[after]}.`,
      advice: AT_RISK.includes(after) ? 'Open the BOM to choose a replacement.' : 'It is no longer flagged as a risk.',
    };
  }
  const other = change.after as ApprovedEquivalentChange;
  return {
    title: `${change.partNumber} has an approved equivalent: ${other.partNumber}`,
    detail:
      `An editor approved ${other.manufacturer} ${other.partNumber} in place of ${part} for “${other.use}”.` +
      (other.note.trim() ? ` Note: ${other.note.trim()}` : ''),
    advice: 'Open the BOM to consider it as a replacement.',
  };
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function bomPhrase(bom: NotifiedBom): string {
  return `${bom.name} (${plural(bom.lines, 'line')})`;
}

function joinWords(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items.at(-1)}`;
}

/** The notice's body as the app shows it. */
export function noticeBody(words: ChangeWords, boms: NotifiedBom[]): string {
  return `${words.detail} Used in ${joinWords(boms.map(bomPhrase))}. ${words.advice}`;
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

const bomLink = (appUrl: string, bom: NotifiedBom) => `${appUrl}/boms/${bom.id}`;
const settingsLink = (appUrl: string) => `${appUrl}/settings/alerts`;

export interface NoticeForMail {
  words: ChangeWords;
  boms: NotifiedBom[];
}

function textSection({ words, boms }: NoticeForMail, appUrl: string): string[] {
  return [words.detail, '', 'Your watched BOMs that use it:', ...boms.map((b) => `- ${bomPhrase(b)}: ${bomLink(appUrl, b)}`), '', words.advice];
}

function htmlSection({ words, boms }: NoticeForMail, appUrl: string, heading: boolean): string {
  return [
    heading ? `<h3>${escapeHtml(words.title)}</h3>` : '',
    `<p>${escapeHtml(words.detail)}</p>`,
    '<p>Your watched BOMs that use it:</p>',
    `<ul>${boms.map((b) => `<li><a href="${escapeHtml(bomLink(appUrl, b))}">${escapeHtml(b.name)}</a> (${plural(b.lines, 'line')})</li>`).join('')}</ul>`,
    `<p>${escapeHtml(words.advice)}</p>`,
  ].join('\n');
}

function footer(appUrl: string): { text: string[]; html: string } {
  const why = 'You get this because you watch these BOMs. To get alerts once a day, or only in the app:';
  return {
    text: ['', '--', why, settingsLink(appUrl)],
    html: `<hr><p style="color:#666">${escapeHtml(why)} <a href="${escapeHtml(settingsLink(appUrl))}">alert settings</a></p>`,
  };
}

/** One change, one person: sent at once to those who chose immediate delivery. */
export function alertMail(input: { to: string; name: string; appUrl: string; notice: NoticeForMail }): OutgoingMail {
  const { words, boms } = input.notice;
  const foot = footer(input.appUrl);
  return {
    to: input.to,
    subject: `${words.title} — used in ${boms.length} of your BOMs`,
    text: [`Hello ${input.name},`, '', ...textSection(input.notice, input.appUrl), ...foot.text].join('\n'),
    html: [`<p>Hello ${escapeHtml(input.name)},</p>`, htmlSection(input.notice, input.appUrl, false), foot.html].join('\n'),
  };
}

/** Everything a person on the daily digest has not yet been mailed or read, in one message. */
export function digestMail(input: { to: string; name: string; appUrl: string; notices: NoticeForMail[] }): OutgoingMail {
  const foot = footer(input.appUrl);
  const count = plural(input.notices.length, 'change');
  return {
    to: input.to,
    subject: `Understudy daily digest: ${count} to parts in your BOMs`,
    text: [
      `Hello ${input.name},`,
      '',
      `Since your last digest, ${count} touched parts used in your watched BOMs.`,
      ...input.notices.flatMap((n, i) => ['', `${i + 1}. ${n.words.title}`, ...textSection(n, input.appUrl)]),
      ...foot.text,
    ].join('\n'),
    html: [
      `<p>Hello ${escapeHtml(input.name)},</p>`,
      `<p>Since your last digest, ${count} touched parts used in your watched BOMs.</p>`,
      ...input.notices.map((n) => htmlSection(n, input.appUrl, true)),
      foot.html,
    ].join('\n'),
  };
}
