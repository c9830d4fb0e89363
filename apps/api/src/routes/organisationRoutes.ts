import { Router, type RequestHandler } from 'express';
import { OrganisationProfileUpdate } from '@kerfmark/contracts';
import { parse } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The caller's own organisation: every member reads its profile, the admins keep it. */
export function organisationRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/profile', async (req, res) => {
    res.json(await services.organisation.profile(req.user!));
  });

  router.patch('/profile', allow({ roles: ['admin'] }), async (req, res) => {
    res.json(await services.organisation.updateProfile(req.user!, parse(OrganisationProfileUpdate, req.body)));
  });

  return router;
}
