import { Router, type RequestHandler } from 'express';
import { DieRunInput, LibraryDieUpdate } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The die library: a printer's own dies in storage, and die shops' listed stock dies. */
export function libraryRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const id = (value: unknown) => parseId(value, 'That die');

  router.get('/library', requireAuth, async (req, res) => {
    res.json(await services.library.list(req.user!));
  });
  router.get('/library/:id', requireAuth, async (req, res) => {
    res.json(await services.library.get(req.user!, id(req.params.id)));
  });
  router.patch('/library/:id', requireAuth, async (req, res) => {
    res.json(await services.library.update(req.user!, id(req.params.id), parse(LibraryDieUpdate, req.body)));
  });
  router.post('/library/:id/runs', requireAuth, allow({ kind: 'printer' }), async (req, res) => {
    res.status(201).json(await services.library.addRun(req.user!, id(req.params.id), parse(DieRunInput, req.body)));
  });
  router.get('/requests/:id/library-matches', requireAuth, allow({ kind: 'printer' }), async (req, res) => {
    res.json(await services.library.matchesFor(req.user!, parseId(req.params.id, 'That die request')));
  });
  return router;
}
