import { Router, type RequestHandler } from 'express';
import { notificationKinds, PreferencesUpdate, type PreferencesDto } from '@kerfmark/contracts';
import { parse } from '../lib/parse';
import { User } from '../models';
import type { Services } from '../services';

const preferencesOf = (stored: Record<string, boolean> | null | undefined): PreferencesDto => ({
  email: Object.fromEntries(notificationKinds.map((k) => [k, stored?.[k] !== false])) as PreferencesDto['email'],
});

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
    const user = await User.query().findById(req.user!.id).select('preferences');
    res.json(preferencesOf(user?.preferences));
  });

  router.put('/preferences', async (req, res) => {
    const { email } = parse(PreferencesUpdate, req.body);
    const user = await User.query().findById(req.user!.id).select('preferences');
    const preferences = { ...(user?.preferences ?? {}), ...email };
    await User.query().patch({ preferences }).findById(req.user!.id);
    res.json(preferencesOf(preferences));
  });

  return router;
}
