import type { NotificationDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { notFound } from '../lib/httpError';
import { Notification } from '../models';

const toDto = (n: Notification): NotificationDto => ({
  id: n.id,
  kind: n.kind,
  title: n.title,
  body: n.body,
  link: n.link,
  readAt: n.readAt?.toISOString() ?? null,
  createdAt: n.createdAt.toISOString(),
});

/** The user's own notifications, newest first (the last 100), and how many are unread. */
export async function inbox(actor: AuthUser): Promise<{ items: NotificationDto[]; unread: number }> {
  const [items, unread] = await Promise.all([
    Notification.query().where({ userId: actor.id }).orderBy('id', 'desc').limit(100),
    Notification.query().where({ userId: actor.id }).whereNull('readAt').resultSize(),
  ]);
  return { items: items.map(toDto), unread };
}

/** Marks one of the user's notifications read; another user's is the same 404 as none. */
export async function markRead(actor: AuthUser, id: number): Promise<void> {
  const updated = await Notification.query().patch({ readAt: new Date() }).where({ id, userId: actor.id });
  if (!updated) throw notFound('That notification');
}

export async function markAllRead(actor: AuthUser): Promise<void> {
  await Notification.query().patch({ readAt: new Date() }).where({ userId: actor.id }).whereNull('readAt');
}

/** The signed-in user's in-app notifications. */
export function createInboxService() {
  return { inbox, markRead, markAllRead };
}
