import type { DataSource, EntityManager } from 'typeorm';
import type { Lifecycle, PartChangeKind } from '@understudy/shared-types';
import type { AppConfig } from '../../config';
import type { ApprovedEquivalentChange, NotifiedBom } from '../../entities';
import type { Mailer } from '../../mail/mailer';
import { QUEUES, type JobQueue } from '../../queue/job-queue';
import { recheckBom } from '../boms/boms.service';
import { alertMail, describeChange, digestMail, noticeBody, type ChangeFacts } from './alerts.templates';

export interface AlertDeps {
  db: DataSource;
  mailer: Mailer;
  config: Pick<AppConfig, 'appUrl'>;
}

// --- Recording changes, in the caller's transaction --------------------------------------------------------------

async function recordChange(
  tx: EntityManager,
  queue: JobQueue,
  change: { partId: string; kind: PartChangeKind; before: unknown; after: unknown; equivalentId?: string | null; actorId: string | null },
): Promise<string> {
  const rows: { id: string }[] = await tx.query(
    `INSERT INTO part_changes (part_id, kind, before, after, equivalent_id, actor_id) VALUES ($1, $2, $3::jsonb, $4::jsonb, $5, $6) RETURNING id`,
    [change.partId, change.kind, JSON.stringify(change.before ?? null), JSON.stringify(change.after ?? null), change.equivalentId ?? null, change.actorId],
  );
  const id = rows[0]!.id;
  // Sent in the same transaction: a rolled-back edit leaves neither the change nor its job behind.
  await queue.send(QUEUES.fanOutPartChange, { changeId: id }, tx);
  return id;
}

/** A part's lifecycle moved (active → obsolete…). `tx` must be the transaction that saves the part. */
export function recordLifecycleChange(tx: EntityManager, queue: JobQueue, input: { partId: string; before: Lifecycle; after: Lifecycle; actorId: string | null }) {
  return recordChange(tx, queue, { partId: input.partId, kind: 'lifecycle', before: input.before, after: input.after, actorId: input.actorId });
}

/** A ruling became approved: each of the two parts gained an equivalent, so each gets its own change. */
export async function recordApprovedEquivalent(
  tx: EntityManager,
  queue: JobQueue,
  input: { equivalentId: string; partIds: [string, string]; use: string; note: string; actorId: string | null },
): Promise<string[]> {
  const parts: { id: string; part_number: string; manufacturer: string }[] = await tx.query(
    `SELECT p.id, p.part_number, m.name AS manufacturer FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE p.id = ANY($1::uuid[])`,
    [input.partIds],
  );
  const ids: string[] = [];
  for (const partId of input.partIds) {
    const other = parts.find((p) => p.id !== partId);
    if (!other) continue;
    const after: ApprovedEquivalentChange = { partId: other.id, partNumber: other.part_number, manufacturer: other.manufacturer, use: input.use, note: input.note };
    ids.push(await recordChange(tx, queue, { partId, kind: 'approved-equivalent', before: null, after, equivalentId: input.equivalentId, actorId: input.actorId }));
  }
  return ids;
}

// --- Fan-out: one notice per person and change ------------------------------------------------------------------

interface ChangeRow {
  id: string;
  kind: PartChangeKind;
  before: unknown;
  after: unknown;
  part_number: string;
  manufacturer: string;
}

const CHANGE_FACTS = `SELECT c.id, c.kind, c.before, c.after, p.part_number, m.name AS manufacturer
  FROM part_changes c JOIN parts p ON p.id = c.part_id JOIN manufacturers m ON m.id = p.manufacturer_id`;

const facts = (row: Pick<ChangeRow, 'kind' | 'before' | 'after' | 'part_number' | 'manufacturer'>): ChangeFacts => ({
  kind: row.kind,
  partNumber: row.part_number,
  manufacturer: row.manufacturer,
  before: row.before,
  after: row.after,
});

interface AudienceRow {
  user_id: string;
  bom_id: string;
  bom_name: string;
  lines: number;
}

/**
 * Owners of watched BOMs with a line that uses the part, as matched or as the chosen replacement. People a BOM is
 * shared with read it but are not alerted: the owner decides what to do with it.
 */
async function audience(db: DataSource | EntityManager, partId: string): Promise<Map<string, NotifiedBom[]>> {
  const rows: AudienceRow[] = await db.query(
    `SELECT b.owner_id AS user_id, b.id AS bom_id, b.name AS bom_name, count(*)::int AS lines
       FROM bom_lines l
       JOIN boms b ON b.id = l.bom_id
       JOIN users u ON u.id = b.owner_id
      WHERE (l.part_id = $1 OR l.replacement_part_id = $1) AND b.watched AND NOT u.disabled
      GROUP BY b.owner_id, b.id, b.name
      ORDER BY b.owner_id, b.name, b.id`,
    [partId],
  );
  const byUser = new Map<string, NotifiedBom[]>();
  for (const r of rows) {
    const list = byUser.get(r.user_id) ?? [];
    list.push({ id: r.bom_id, name: r.bom_name, lines: r.lines });
    byUser.set(r.user_id, list);
  }
  return byUser;
}

export interface FanOutResult {
  /** Notices written by this run (0 on a rerun). */
  notified: number;
  /** Immediate mails accepted by the mail server in this run. */
  emailed: number;
}

/**
 * The fan-out job for one change. Notices are inserted with ON CONFLICT DO NOTHING on (user, change), so running it
 * again adds nothing; then every notice of the change still waiting for an immediate mail is mailed. A mail the
 * server refuses leaves its notice unmailed and fails the job, so the queue tries again later; a notice that has
 * been mailed is never mailed again.
 */
export async function fanOutChange(deps: AlertDeps, changeId: string): Promise<FanOutResult> {
  const change: ChangeRow | undefined = (await deps.db.query(`${CHANGE_FACTS} WHERE c.id = $1`, [changeId]))[0];
  // The part was deleted since (changes go with it): nothing left to say.
  if (!change) return { notified: 0, emailed: 0 };
  const words = describeChange(facts(change));

  const notified = await deps.db.transaction(async (tx) => {
    // Two runs of the same change take turns, so the second sees the first one's notices.
    const locked: { part_id: string }[] = await tx.query(`SELECT part_id FROM part_changes WHERE id = $1 FOR UPDATE`, [changeId]);
    let inserted = 0;
    for (const [userId, boms] of await audience(tx, locked[0]!.part_id)) {
      const rows: unknown[] = await tx.query(
        `INSERT INTO notifications (user_id, change_id, title, body, boms) VALUES ($1, $2, $3, $4, $5::jsonb)
         ON CONFLICT (user_id, change_id) DO NOTHING RETURNING id`,
        [userId, changeId, words.title, noticeBody(words, boms), JSON.stringify(boms)],
      );
      if (!rows.length) continue;
      inserted++;
      // The BOM's history shows the change as a check of its own, once: a rerun inserts nothing and checks nothing.
      for (const bom of boms) await recheckBom(tx, bom.id, { trigger: 'change', actorId: null });
    }
    return inserted;
  });

  const waiting: { id: string; email: string; name: string; boms: NotifiedBom[] }[] = await deps.db.query(
    `SELECT n.id, u.email, u.name, n.boms
       FROM notifications n
       JOIN users u ON u.id = n.user_id
       LEFT JOIN alert_preferences a ON a.user_id = n.user_id
      WHERE n.change_id = $1 AND n.emailed_at IS NULL AND n.read_at IS NULL AND NOT u.disabled
        AND coalesce(a.delivery, 'immediate') = 'immediate'
      ORDER BY n.created_at, n.id`,
    [changeId],
  );
  let emailed = 0;
  const failures: unknown[] = [];
  for (const notice of waiting) {
    try {
      const sent = await mailOnce(deps, [notice.id], alertMail({ to: notice.email, name: notice.name, appUrl: deps.config.appUrl, notice: { words, boms: notice.boms } }));
      if (sent) emailed++;
    } catch (err) {
      failures.push(err);
    }
  }
  if (failures.length) throw new AlertDeliveryError(failures.length, waiting.length, failures[0]);
  return { notified, emailed };
}

export class AlertDeliveryError extends Error {
  constructor(failed: number, total: number, cause: unknown) {
    super(`${failed} of ${total} alert mails were not accepted; the job will try again.`);
    this.cause = cause;
  }
}

/**
 * Sends `mail` for these notices unless another run already has, and stamps them. The rows stay locked while the
 * mail goes out, so two workers never both send it; a refused mail rolls back and leaves them unmailed.
 */
async function mailOnce(deps: AlertDeps, noticeIds: string[], mail: Parameters<Mailer['send']>[0], stamp: Date = new Date()): Promise<boolean> {
  return deps.db.transaction(async (tx) => {
    const claimed: { id: string }[] = await tx.query(
      `SELECT id FROM notifications WHERE id = ANY($1::uuid[]) AND emailed_at IS NULL FOR UPDATE SKIP LOCKED`,
      [noticeIds],
    );
    if (claimed.length !== noticeIds.length) return false;
    await deps.mailer.send(mail);
    await tx.query(`UPDATE notifications SET emailed_at = $2 WHERE id = ANY($1::uuid[])`, [noticeIds, stamp]);
    return true;
  });
}

// --- The daily digest -------------------------------------------------------------------------------------------

export interface DigestResult {
  /** People who were sent a digest. */
  people: number;
  /** Notices those digests covered. */
  notices: number;
  /** People whose digest the mail server refused; their notices wait for the next run. */
  failed: number;
}

/**
 * One mail per person on the daily digest, listing every notice written up to `now` that has been neither mailed
 * nor read in the app. Running it again right after sends nothing.
 */
export async function sendDigests(deps: AlertDeps, now: Date = new Date()): Promise<DigestResult> {
  const people: { id: string; email: string; name: string }[] = await deps.db.query(
    `SELECT u.id, u.email, u.name
       FROM users u JOIN alert_preferences a ON a.user_id = u.id AND a.delivery = 'daily'
      WHERE NOT u.disabled
        AND EXISTS (SELECT 1 FROM notifications n WHERE n.user_id = u.id AND n.emailed_at IS NULL AND n.read_at IS NULL AND n.created_at <= $1)
      ORDER BY u.id`,
    [now],
  );
  const result: DigestResult = { people: 0, notices: 0, failed: 0 };
  for (const person of people) {
    const notices: (ChangeRow & { notice_id: string; boms: NotifiedBom[] })[] = await deps.db.query(
      `SELECT n.id AS notice_id, n.boms, c.kind, c.before, c.after, p.part_number, m.name AS manufacturer
         FROM notifications n
         JOIN part_changes c ON c.id = n.change_id
         JOIN parts p ON p.id = c.part_id
         JOIN manufacturers m ON m.id = p.manufacturer_id
        WHERE n.user_id = $1 AND n.emailed_at IS NULL AND n.read_at IS NULL AND n.created_at <= $2
        ORDER BY n.created_at, n.id`,
      [person.id, now],
    );
    if (!notices.length) continue;
    const mail = digestMail({
      to: person.email,
      name: person.name,
      appUrl: deps.config.appUrl,
      notices: notices.map((n) => ({ words: describeChange(facts(n)), boms: n.boms })),
    });
    try {
      if (await mailOnce(deps, notices.map((n) => n.notice_id), mail, now)) {
        result.people++;
        result.notices += notices.length;
      }
    } catch {
      result.failed++;
    }
  }
  return result;
}
