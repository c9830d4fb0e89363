import { DieShopsQuery, OpenRequestsQuery } from '@kerfmark/contracts';
import { Router, type RequestHandler } from 'express';
import { parse } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The die shops' side: open requests to bid on; and the printers' list of shops to invite. */
export function openRequestRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get('/open-requests', requireAuth, allow({ kind: 'die_shop' }), async (req, res) => {
    res.json(await services.requests.openRequests(req.user!, parse(OpenRequestsQuery, req.query)));
  });

  router.get('/die-shops', requireAuth, allow({ kind: 'printer' }), async (req, res) => {
    res.json(await services.requests.dieShops(req.user!, parse(DieShopsQuery, req.query)));
  });

  return router;
}
