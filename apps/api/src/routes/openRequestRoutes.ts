import { DieShopsQuery, OpenRequestsQuery } from '@kerfmark/contracts';
import { Router, type RequestHandler } from 'express';
import { parse } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The die shops' side: open requests to bid on; and the printers' list of shops to invite. */
export function openRequestRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  // The board is reloaded many times a day: a reload that sends its tag and finds nothing new is
  // a 304, answered from one aggregate query without reading the rows (the browser revalidates:
  // no-cache). Otherwise the page and its tag come from one query.
  router.get('/open-requests', requireAuth, allow({ kind: 'die_shop' }), async (req, res) => {
    const q = parse(OpenRequestsQuery, req.query);
    res.set('Cache-Control', 'private, no-cache').set('Vary', 'Authorization');
    if (req.get('If-None-Match')) {
      res.set('ETag', await services.requests.boardVersion(req.user!, q));
      if (req.fresh) {
        res.status(304).end();
        return;
      }
    }
    const { page, tag } = await services.requests.openRequests(req.user!, q);
    res.set('ETag', tag).json(page);
  });

  router.get('/die-shops', requireAuth, allow({ kind: 'printer' }), async (req, res) => {
    res.json(await services.requests.dieShops(req.user!, parse(DieShopsQuery, req.query)));
  });

  return router;
}
