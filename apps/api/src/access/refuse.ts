import { HttpError } from '../lib/httpError';
import { actionRefusal, type RequestAction } from './actions';
import type { Refusal } from './deadline';
import type { Actor, RequestFacts } from './facts';

const CODES = { 400: 'validation_failed', 403: 'forbidden', 404: 'not_found', 409: 'conflict' } as const;

/** A refusal as the API answers it. */
export function refuse(refusal: Refusal, code?: string): HttpError {
  return new HttpError(
    refusal.status,
    code ?? CODES[refusal.status],
    refusal.message,
    refusal.field ? { [refusal.field]: refusal.message } : undefined,
  );
}

/** Throws unless the actor may take the action on the request now. */
export function assertMay(actor: Actor, f: RequestFacts, action: RequestAction, now = new Date(), code?: string): void {
  const refusal = actionRefusal(actor, f, action, now);
  if (refusal) throw refuse(refusal, code);
}
