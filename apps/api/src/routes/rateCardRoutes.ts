import { Router, type RequestHandler } from 'express';
import { EstimateQuery, RateCardInput } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The die shop's rate card: its people read it and estimate from it; its admin saves it. */
export function rateCardRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const shop = [requireAuth, allow({ kind: 'die_shop' })];
  const admin = [requireAuth, allow({ kind: 'die_shop', roles: ['admin'] })];

  router.get('/rate-card', ...shop, async (req, res) => {
    res.json({ rateCard: await services.rateCards.get(req.user!) });
  });
  router.put('/rate-card', ...admin, async (req, res) => {
    res.json(await services.rateCards.save(req.user!, parse(RateCardInput, req.body)));
  });
  router.get('/rate-card/calibration', ...shop, async (req, res) => {
    res.json(await services.rateCards.calibration(req.user!));
  });
  router.get('/requests/:id/estimate', ...shop, async (req, res) => {
    const query = parse(EstimateQuery, req.query);
    res.json(await services.rateCards.estimate(req.user!, parseId(req.params.id, 'That die request'), query));
  });
  return router;
}
