import { Router, type RequestHandler } from 'express';
import { LoginInput } from '@kerfmark/contracts';
import { parse } from '../lib/parse';
import type { Services } from '../services';

export function authRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();

  router.post('/login', async (req, res) => {
    const input = parse(LoginInput, req.body);
    res.json(await services.auth.login(input, req.ip ?? 'unknown'));
  });

  router.post('/logout', requireAuth, async (req, res) => {
    await services.auth.logout(req.user!);
    res.status(204).end();
  });

  return router;
}
