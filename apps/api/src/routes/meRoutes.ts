import { Router, type RequestHandler } from 'express';
import { PreferencesUpdate } from '@kerfmark/contracts';
import { parse } from '../lib/parse';
import type { Services } from '../services';

export function meRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/', async (req, res) => {
    res.json(await services.auth.me(req.user!));
  });

  router.get('/dashboard', async (req, res) => {
    res.json(await services.dashboard.dashboard(req.user!));
  });

  /** Which notices also come by e-mail; every kind is on until the user turns it off. */
  router.get('/preferences', async (req, res) => {
    res.json(await services.preferences.read(req.user!));
  });

  router.put('/preferences', async (req, res) => {
    res.json(await services.preferences.update(req.user!, parse(PreferencesUpdate, req.body)));
  });

  return router;
}
