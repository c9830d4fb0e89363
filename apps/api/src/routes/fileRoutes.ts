import { Router, type RequestHandler } from 'express';
import { LayerMapUpdate, PdfPageUpdate } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** Dieline files: readable by whoever may see the request; changed by the printer that owns it. */
export function fileRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth);
  const printer = allow({ kind: 'printer' });
  const id = (value: unknown) => parseId(value, 'That file');

  router.get('/:id', async (req, res) => {
    res.json(await services.files.get(req.user!, id(req.params.id)));
  });

  router.get('/:id/preview', async (req, res) => {
    res.json({ preview: await services.files.preview(req.user!, id(req.params.id)) });
  });

  router.get('/:id/download', async (req, res) => {
    res.json(await services.files.downloadUrl(req.user!, id(req.params.id)));
  });

  router.post('/:id/primary', printer, async (req, res) => {
    res.json(await services.files.makePrimary(req.user!, id(req.params.id)));
  });

  router.put('/:id/layers', printer, async (req, res) => {
    const { layerMap } = parse(LayerMapUpdate, req.body);
    res.json(await services.files.remap(req.user!, id(req.params.id), layerMap));
  });

  router.put('/:id/page', printer, async (req, res) => {
    const { page } = parse(PdfPageUpdate, req.body);
    res.json(await services.files.choosePage(req.user!, id(req.params.id), page));
  });

  router.delete('/:id', printer, async (req, res) => {
    await services.files.remove(req.user!, id(req.params.id));
    res.status(204).end();
  });

  return router;
}
