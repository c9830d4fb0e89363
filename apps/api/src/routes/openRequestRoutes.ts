import { DieShopsQuery, OpenRequestsQuery } from '@kerfmark/contracts';
import { Router, type RequestHandler } from 'express';
import { parse } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The die shops' side: open requests to bid on; and the printers' list of shops to invite. */
export function openRequestRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  // The board is reloaded many times a day: a reload that finds nothing new is a 304, answered
  // from one aggregate query without reading the rows (the browser revalidates: no-cache).
  router.get('/open-requests', requireAuth, allow({ kind: 'die_shop' }), async (req, res) => {
    const q = parse(OpenRequestsQuery, req.query);
    const { tag, total } = await services.requests.boardVersion(req.user!, q);
    res.set('ETag', tag).set('Cache-Control', 'private, no-cache').set('Vary', 'Authorization');
    if (req.fresh) {
      res.status(304).end();
      return;
    }
    res.json(await services.requests.openRequests(req.user!, q, total));
  });

  router.get('/die-shops', requireAuth, allow({ kind: 'printer' }), async (req, res) => {
    res.json(await services.requests.dieShops(req.user!, parse(DieShopsQuery, req.query)));
  });

  return router;
}
