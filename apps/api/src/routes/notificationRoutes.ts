import { Router, type RequestHandler } from 'express';
import { parseId } from '../lib/parse';
import type { Services } from '../services';

/** The signed-in user's own notifications, newest first. */
export function notificationRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/', async (req, res) => {
    res.json(await services.inbox.inbox(req.user!));
  });
  router.post('/:id/read', async (req, res) => {
    await services.inbox.markRead(req.user!, parseId(req.params.id, 'That notification'));
    res.status(204).end();
  });
  router.post('/read-all', async (req, res) => {
    await services.inbox.markAllRead(req.user!);
    res.status(204).end();
  });

  return router;
}
