import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';

// What a load balancer or a client may pass on: short, and nothing that could break a log line
// or a header (no spaces, CR or LF).
const WELL_FORMED = /^[A-Za-z0-9._-]{1,64}$/;

/**
 * Gives every request an id, the caller's `X-Request-Id` when it is well-formed, else a new
 * UUID, and answers it in the same header; the logs and error bodies carry it too.
 */
export const requestId: RequestHandler = (req, res, next) => {
  const incoming = req.get('X-Request-Id');
  req.id = incoming && WELL_FORMED.test(incoming) ? incoming : randomUUID();
  res.set('X-Request-Id', String(req.id));
  next();
};
