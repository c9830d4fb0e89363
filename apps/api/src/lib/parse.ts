import type { z } from 'zod';
import { fieldErrors } from '@kerfmark/contracts';
import { HttpError } from './httpError';

/** Validates input with a shared zod schema; a failure is a 400 naming each field. */
export function parse<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const fields = fieldErrors(result.error);
  const names = Object.keys(fields).filter((k) => k !== '_');
  const message = names.length ? `Check these fields: ${names.join(', ')}.` : (fields._ ?? 'The input is not valid.');
  throw new HttpError(400, 'validation_failed', message, fields);
}

/** Parses a route's numeric id; anything else is a plain 404, as for a missing record. */
export function parseId(value: unknown, what = 'That record'): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0 || id > 2_147_483_647) {
    throw new HttpError(404, 'not_found', `${what} was not found.`);
  }
  return id;
}
