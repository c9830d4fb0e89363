import { Router, type RequestHandler } from 'express';
import { BidInput, DeclineInput } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** Bids: the shops' sealed bids, purchasing's comparison, and the close of bidding. */
export function bidRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const shop = [requireAuth, allow({ kind: 'die_shop' })];
  const printer = [requireAuth, allow({ kind: 'printer' })];
  const requestId = (value: unknown) => parseId(value, 'That die request');

  router.post('/requests/:id/bids', ...shop, async (req, res) => {
    res.status(201).json(await services.bids.submit(req.user!, requestId(req.params.id), parse(BidInput, req.body)));
  });
  router.get('/estimate-aid', ...shop, async (req, res) => {
    res.json(await services.bids.estimateAid(req.user!));
  });
  router.get('/requests/:id/my-bid', ...shop, async (req, res) => {
    res.json(await services.bids.mine(req.user!, requestId(req.params.id)));
  });
  router.post('/requests/:id/decline', ...shop, async (req, res) => {
    await services.bids.decline(req.user!, requestId(req.params.id), parse(DeclineInput, req.body).reason);
    res.status(204).end();
  });
  router.patch('/bids/:id', ...shop, async (req, res) => {
    res.json(await services.bids.revise(req.user!, parseId(req.params.id, 'That bid'), parse(BidInput, req.body)));
  });
  router.post('/bids/:id/withdraw', ...shop, async (req, res) => {
    res.json(await services.bids.withdraw(req.user!, parseId(req.params.id, 'That bid')));
  });

  router.get('/requests/:id/bids', ...printer, async (req, res) => {
    res.json(await services.bids.compare(req.user!, requestId(req.params.id)));
  });
  router.post('/requests/:id/close-bidding', ...printer, async (req, res) => {
    res.json(await services.bids.closeBidding(req.user!, requestId(req.params.id)));
  });

  return router;
}
