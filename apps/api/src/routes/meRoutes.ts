import { Router, type RequestHandler } from 'express';
import type { Services } from '../services';

export function meRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get('/', requireAuth, async (req, res) => {
    res.json(await services.auth.me(req.user!));
  });
  return router;
}
