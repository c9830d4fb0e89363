import { Router, type RequestHandler } from 'express';
import { AwardInput } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The award and its purchase documents: the purchase order PDF and the Open Contracting release. */
export function awardRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const printer = [requireAuth, allow({ kind: 'printer' })];
  const requestId = (value: unknown) => parseId(value, 'That die request');

  router.post('/requests/:id/award', ...printer, async (req, res) => {
    res.json(await services.awards.award(req.user!, requestId(req.params.id), parse(AwardInput, req.body)));
  });
  router.get('/requests/:id/ocds', ...printer, async (req, res) => {
    res.json(await services.purchaseDocuments.ocds(req.user!, requestId(req.params.id)));
  });
  router.get('/purchase-orders/:id/pdf', requireAuth, async (req, res) => {
    const { fileName, pdf } = await services.purchaseDocuments.purchaseOrder(
      req.user!,
      parseId(req.params.id, 'That purchase order'),
    );
    res.set({
      'Content-Type': 'application/pdf',
      'Content-Disposition': `inline; filename="${fileName}"`,
      'Cache-Control': 'private, no-store',
    });
    res.send(pdf);
  });

  return router;
}
