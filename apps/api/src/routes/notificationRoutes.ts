import { Router, type RequestHandler } from 'express';
import type { NotificationDto } from '@kerfmark/contracts';
import { parseId } from '../lib/parse';
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

/** The signed-in user's own notifications, newest first. */
export function notificationRoutes(requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/', async (req, res) => {
    const [items, unread] = await Promise.all([
      Notification.query().where({ userId: req.user!.id }).orderBy('id', 'desc').limit(100),
      Notification.query().where({ userId: req.user!.id }).whereNull('readAt').resultSize(),
    ]);
    res.json({ items: items.map(toDto), unread });
  });

  router.post('/:id/read', async (req, res) => {
    const updated = await Notification.query()
      .patch({ readAt: new Date() })
      .where({ id: parseId(req.params.id, 'That notification'), userId: req.user!.id });
    if (!updated) throw notFound('That notification');
    res.status(204).end();
  });

  router.post('/read-all', async (req, res) => {
    await Notification.query().patch({ readAt: new Date() }).where({ userId: req.user!.id }).whereNull('readAt');
    res.status(204).end();
  });

  return router;
}
