import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { ImportMapping, PriceHistoryQuery } from '@kerfmark/contracts';
import { HttpError } from '../lib/httpError';
import { parse } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

const MAX_CSV_BYTES = 5 * 1024 * 1024;
const csvUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_CSV_BYTES, files: 1, fields: 4, fieldSize: 20_000 },
}).single('file');

/** The CSV of an import, from a multipart upload: a clear 413 past the size limit. */
const readCsv: RequestHandler = (req, res, next) => {
  csvUpload(req, res, (error: unknown) => {
    if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE')
      return next(new HttpError(413, 'file_too_large', 'The CSV is larger than 5 MB; split it and import the parts.'));
    if (error)
      return next(new HttpError(400, 'bad_upload', 'The upload was not understood. Send the CSV in the field "file".'));
    if (!req.file)
      return next(new HttpError(400, 'validation_failed', 'Choose a CSV file.', { file: 'Choose a file' }));
    const text = req.file.buffer.toString('utf8');
    if (text.includes('\u0000')) return next(new HttpError(415, 'unsupported_file', 'That is not a text CSV file.'));
    res.locals.csv = text;
    next();
  });
};

/** The printer's price history: every printer role reads it; purchasing and admins import. */
export function priceHistoryRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth, allow({ kind: 'printer' }));
  const importers = allow({ roles: ['purchasing', 'admin'] });

  router.get('/', async (req, res) => {
    res.json(await services.priceHistory.list(req.user!, parse(PriceHistoryQuery, req.query)));
  });

  router.get('/export.csv', async (req, res) => {
    const csv = await services.priceHistory.csv(req.user!, parse(PriceHistoryQuery, req.query));
    res
      .set({
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': 'attachment; filename="price-history.csv"',
      })
      .send(csv);
  });

  router.get('/fit', async (req, res) => {
    res.json(await services.priceHistory.fit(req.user!, parse(PriceHistoryQuery, req.query)));
  });

  router.post('/import/preview', importers, readCsv, async (_req, res) => {
    res.json(services.priceHistory.preview(res.locals.csv as string));
  });

  router.post('/import', importers, readCsv, async (req, res) => {
    let mapping: unknown;
    try {
      mapping = JSON.parse(String(req.body?.mapping ?? '{}'));
    } catch {
      throw new HttpError(400, 'validation_failed', 'The column mapping is not valid JSON.', { mapping: 'Not valid' });
    }
    res
      .status(201)
      .json(await services.priceHistory.importCsv(req.user!, res.locals.csv as string, parse(ImportMapping, mapping)));
  });

  return router;
}
