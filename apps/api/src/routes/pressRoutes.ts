import { Router, type RequestHandler } from 'express';
import { PressCreate, PressUpdate } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** A printer's die-cutting presses: every member reads them, the admin keeps them. */
export function pressRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth, allow({ kind: 'printer' }));
  const adminOnly = allow({ roles: ['admin'] });

  router.get('/', async (req, res) => {
    res.json(await services.presses.list(req.user!));
  });

  router.post('/', adminOnly, async (req, res) => {
    res.status(201).json(await services.presses.create(req.user!, parse(PressCreate, req.body)));
  });

  router.patch('/:id', adminOnly, async (req, res) => {
    const id = parseId(req.params.id, 'That press');
    res.json(await services.presses.update(req.user!, id, parse(PressUpdate, req.body)));
  });

  return router;
}
