import type { ErrorRequestHandler, Request, RequestHandler, Response } from 'express';
import type { Logger } from 'pino';
import { HttpError } from '../lib/httpError';

// Errors of a database or queue that is down or restarting, by node or PostgreSQL code.
const UNAVAILABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  '57P01', // admin_shutdown
  '57P02', // crash_shutdown
  '57P03', // cannot_connect_now
  '08000',
  '08003',
  '08006',
]);

// "is not queryable": pg refuses a client whose connection broke; knex reports it from the
// ROLLBACK it tries after a query failed mid-transaction (the server has rolled back already).
const UNAVAILABLE_MESSAGE =
  /Connection terminated|connection is closed|Timeout acquiring a connection|is not queryable/i;

function isUnavailable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 3) return false;
  const e = error as { code?: string; message?: string; name?: string; nativeError?: unknown; cause?: unknown };
  if (e.code && UNAVAILABLE_CODES.has(e.code)) return true;
  if (e.name === 'KnexTimeoutError') return true;
  if (UNAVAILABLE_MESSAGE.test(e.message ?? '')) return true;
  // Objection wraps PostgreSQL's errors in a DBError that keeps the code on its nativeError only
  // (a server shutting down, 57P01, would otherwise be a 500); other errors may carry a cause.
  return isUnavailable(e.nativeError, depth + 1) || isUnavailable(e.cause, depth + 1);
}

/** Every error body: `{ error: { code, message, …, requestId } }`, the id that finds it in the logs. */
function sendError(req: Request, res: Response, status: number, error: Record<string, unknown>) {
  res.status(status).json({ error: { ...error, requestId: req.id } });
}

// body-parser's own errors carry a 4xx status and a `type` (its documented error types).
const BODY_ERRORS: Record<string, { status: number; code: string; message: string }> = {
  'entity.too.large': { status: 413, code: 'payload_too_large', message: 'The request body is too large.' },
  'entity.parse.failed': { status: 400, code: 'malformed_json', message: 'The request body is not valid JSON.' },
  'charset.unsupported': {
    status: 415,
    code: 'unsupported_charset',
    message: 'The request body’s charset is not one Kerfmark reads; send UTF-8.',
  },
  'encoding.unsupported': {
    status: 415,
    code: 'unsupported_encoding',
    message: 'The request body’s Content-Encoding is not one Kerfmark reads; send it plain, gzip or deflate.',
  },
};
const UNREADABLE = {
  status: 400,
  code: 'unreadable_body',
  message: 'The request body could not be read (a broken compressed body, or one cut short).',
};
// zlib's codes for a compressed body that is not what its Content-Encoding says.
const ZLIB_CODES = new Set(['Z_DATA_ERROR', 'Z_BUF_ERROR', 'Z_STREAM_ERROR', 'Z_NEED_DICT']);

/** The answer to a body the parser could not read, or undefined when the error is no such thing. */
function bodyError(error: unknown): { status: number; code: string; message: string } | undefined {
  const e = error as { type?: unknown; status?: unknown; code?: unknown };
  if (typeof e?.type === 'string' && BODY_ERRORS[e.type]) return BODY_ERRORS[e.type];
  if (typeof e?.code === 'string' && ZLIB_CODES.has(e.code)) return UNREADABLE;
  // Any other 4xx the body reader raises (aborted, size mismatch, stream errors).
  if (typeof e?.type === 'string' && typeof e.status === 'number' && e.status >= 400 && e.status < 500)
    return { ...UNREADABLE, status: e.status };
  return undefined;
}

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    if (res.headersSent) return;
    if (error instanceof HttpError) {
      if (error.headers) res.set(error.headers);
      sendError(req, res, error.status, {
        code: error.code,
        message: error.message,
        fields: error.fields,
        details: error.details,
      });
      return;
    }
    const unreadable = bodyError(error);
    if (unreadable) {
      sendError(req, res, unreadable.status, { code: unreadable.code, message: unreadable.message });
      return;
    }
    // The router's own: a path parameter with a broken %-escape (e.g. /api/requests/%E0%A4%A).
    if (error instanceof URIError && (error as { status?: number }).status === 400) {
      sendError(req, res, 400, {
        code: 'bad_path',
        message: 'The address has a broken %-escape in it.',
        fields: { path: 'Not a valid address' },
      });
      return;
    }
    if (isUnavailable(error)) {
      logger.warn({ err: error, reqId: req.id }, 'a backing service is unavailable');
      res.set('Retry-After', '5');
      sendError(req, res, 503, {
        code: 'service_unavailable',
        message: 'Kerfmark is briefly unavailable. Try again in a few seconds.',
      });
      return;
    }
    logger.error({ err: error, reqId: req.id }, 'unhandled error');
    sendError(req, res, 500, { code: 'internal', message: 'Something went wrong on our side. It has been logged.' });
  };
}

export const notFoundHandler: RequestHandler = (req, res) => {
  sendError(req, res, 404, { code: 'not_found', message: 'No such API route.' });
};
