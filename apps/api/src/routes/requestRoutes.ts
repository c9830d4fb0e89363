import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import {
  AnswerCreate,
  DieRequestCreate,
  DieRequestUpdate,
  QuestionCreate,
  RequestListQuery,
} from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import { uploadDieline } from '../middleware/uploadDieline';
import type { Services } from '../services';

const CancelInput = z.object({ reason: z.string().trim().max(1000).default('') });

export function requestRoutes(services: Services, requireAuth: RequestHandler, maxUploadBytes: number): Router {
  const router = Router();
  router.use(requireAuth);
  const printer = allow({ kind: 'printer' });
  const id = (value: unknown) => parseId(value, 'That die request');

  router.get('/', printer, async (req, res) => {
    res.json(await services.requests.list(req.user!, parse(RequestListQuery, req.query)));
  });

  router.post('/', printer, async (req, res) => {
    res.status(201).json(await services.requests.create(req.user!, parse(DieRequestCreate, req.body)));
  });

  router.get('/:id', async (req, res) => {
    res.json(await services.requests.detail(req.user!, id(req.params.id)));
  });

  router.get('/:id/fair-price', printer, async (req, res) => {
    res.json(await services.priceHistory.fairPrice(req.user!, id(req.params.id)));
  });

  router.patch('/:id', printer, async (req, res) => {
    res.json(await services.requests.update(req.user!, id(req.params.id), parse(DieRequestUpdate, req.body)));
  });

  router.post('/:id/publish', printer, async (req, res) => {
    res.json(await services.requests.publish(req.user!, id(req.params.id)));
  });

  router.post('/:id/cancel', printer, async (req, res) => {
    const { reason } = parse(CancelInput, req.body);
    res.json(await services.requests.cancel(req.user!, id(req.params.id), reason));
  });

  router.post('/:id/files', printer, uploadDieline(maxUploadBytes), async (req, res) => {
    res.status(201).json(await services.files.upload(req.user!, id(req.params.id), req.file!));
  });

  router.post('/:id/questions', allow({ kind: 'die_shop' }), async (req, res) => {
    const { question } = parse(QuestionCreate, req.body);
    res.status(201).json(await services.requests.ask(req.user!, id(req.params.id), question));
  });

  router.post('/:id/questions/:questionId/answer', printer, async (req, res) => {
    const { answer } = parse(AnswerCreate, req.body);
    res.json(
      await services.requests.answer(
        req.user!,
        id(req.params.id),
        parseId(req.params.questionId, 'That question'),
        answer,
      ),
    );
  });

  return router;
}
