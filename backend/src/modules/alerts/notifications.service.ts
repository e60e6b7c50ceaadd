import { subject } from '@casl/ability';
import type { DataSource } from 'typeorm';
import type { AlertPreferences, AppAbility, NotificationDto, NotificationListResponse, PartChangeKind } from '@understudy/shared-types';
import type { NotifiedBom } from '../../entities';
import { NotFoundError } from '../../errors';

interface NotificationRow {
  id: string;
  user_id: string;
  kind: PartChangeKind;
  title: string;
  body: string;
  part_id: string;
  part_number: string;
  boms: NotifiedBom[];
  created_at: Date;
  read_at: Date | null;
  emailed_at: Date | null;
}

const SELECT = `SELECT n.id, n.user_id, c.kind, n.title, n.body, c.part_id, p.part_number, n.boms, n.created_at, n.read_at, n.emailed_at
  FROM notifications n JOIN part_changes c ON c.id = n.change_id JOIN parts p ON p.id = c.part_id`;

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

function present(row: NotificationRow): NotificationDto {
  return {
    id: row.id,
    kind: row.kind,
    title: row.title,
    body: row.body,
    part: { id: row.part_id, partNumber: row.part_number },
    boms: row.boms,
    createdAt: new Date(row.created_at).toISOString(),
    readAt: iso(row.read_at),
    emailedAt: iso(row.emailed_at),
  };
}

/** The notices listed at most; older ones stay, counted as unread until read. */
export const NOTIFICATION_LIST_LIMIT = 200;

export async function listNotifications(db: DataSource, userId: string, { unreadOnly = false } = {}): Promise<NotificationListResponse> {
  const rows: NotificationRow[] = await db.query(
    `${SELECT} WHERE n.user_id = $1 AND ($2::boolean IS FALSE OR n.read_at IS NULL) ORDER BY n.created_at DESC, n.id DESC LIMIT ${NOTIFICATION_LIST_LIMIT}`,
    [userId, unreadOnly],
  );
  const counted: { unread: number }[] = await db.query(`SELECT count(*)::int AS unread FROM notifications WHERE user_id = $1 AND read_at IS NULL`, [userId]);
  return { items: rows.map(present), unread: counted[0]?.unread ?? 0 };
}

/** Another person's notice answers 404, as if it did not exist. */
export async function markNotificationRead(db: DataSource, ability: AppAbility, id: string): Promise<NotificationDto> {
  const row: NotificationRow | undefined = (await db.query(`${SELECT} WHERE n.id = $1`, [id]))[0];
  if (!row || ability.cannot('update', subject('Notification', { userId: row.user_id }))) throw new NotFoundError('No such notice.');
  // Reading it again keeps the first time it was read.
  await db.query(`UPDATE notifications SET read_at = coalesce(read_at, now()) WHERE id = $1`, [id]);
  return present((await db.query(`${SELECT} WHERE n.id = $1`, [id]))[0]);
}

export async function markAllNotificationsRead(db: DataSource, userId: string): Promise<void> {
  await db.query(`UPDATE notifications SET read_at = now() WHERE user_id = $1 AND read_at IS NULL`, [userId]);
}

export async function getAlertPreferences(db: DataSource, userId: string): Promise<AlertPreferences> {
  const rows: { delivery: AlertPreferences['delivery'] }[] = await db.query(`SELECT delivery FROM alert_preferences WHERE user_id = $1`, [userId]);
  return { delivery: rows[0]?.delivery ?? 'immediate' };
}

export async function setAlertPreferences(db: DataSource, userId: string, prefs: AlertPreferences): Promise<AlertPreferences> {
  await db.query(
    `INSERT INTO alert_preferences (user_id, delivery) VALUES ($1, $2)
     ON CONFLICT (user_id) DO UPDATE SET delivery = EXCLUDED.delivery, updated_at = now()`,
    [userId, prefs.delivery],
  );
  return getAlertPreferences(db, userId);
}
