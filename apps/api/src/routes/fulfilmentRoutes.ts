import { Router, type RequestHandler } from 'express';
import { ReceiveInput, ShipInput } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The die's way back to the printer: the shop starts production and ships, the printer receives. */
export function fulfilmentRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const shop = [requireAuth, allow({ kind: 'die_shop' })];
  const printer = [requireAuth, allow({ kind: 'printer' })];
  const requestId = (value: unknown) => parseId(value, 'That die request');

  router.post('/requests/:id/start-production', ...shop, async (req, res) => {
    res.json(await services.fulfilment.startProduction(req.user!, requestId(req.params.id)));
  });
  router.post('/requests/:id/ship', ...shop, async (req, res) => {
    const { trackingNote } = parse(ShipInput, req.body);
    res.json(await services.fulfilment.ship(req.user!, requestId(req.params.id), trackingNote));
  });
  router.post('/requests/:id/receive', ...printer, async (req, res) => {
    res.json(await services.fulfilment.receive(req.user!, requestId(req.params.id), parse(ReceiveInput, req.body)));
  });

  return router;
}
