import type { z } from 'zod';
import { fieldErrors, maxRecordId } from '@kerfmark/contracts';
import { HttpError } from './httpError';

// Half of a UTF-16 surrogate pair: no character at all, and PostgreSQL refuses it in JSON.
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
const unstorable = (text: string) => text.includes('\u0000') || LONE_SURROGATE.test(text);

/** The dotted path of the first text (a value or a key) PostgreSQL cannot store, if any. */
function unstorableField(value: unknown, path: string[] = []): string | undefined {
  if (typeof value === 'string') return unstorable(value) ? path.join('.') || '_' : undefined;
  if (value === null || typeof value !== 'object') return undefined;
  for (const [key, inner] of Object.entries(value)) {
    const found = unstorable(key) ? [...path, key].join('.') : unstorableField(inner, [...path, key]);
    if (found !== undefined) return found;
  }
  return undefined;
}

/** Validates input with a shared zod schema; a failure is a 400 naming each field. */
export function parse<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) {
    // A NUL byte or half a character passes zod's checks but not the database.
    const field = unstorableField(result.data);
    if (field !== undefined) {
      throw new HttpError(400, 'validation_failed', `Check these fields: ${field}.`, {
        [field]: 'Remove the control or broken character',
      });
    }
    return result.data;
  }
  const fields = fieldErrors(result.error);
  const names = Object.keys(fields).filter((k) => k !== '_');
  const message = names.length ? `Check these fields: ${names.join(', ')}.` : (fields._ ?? 'The input is not valid.');
  throw new HttpError(400, 'validation_failed', message, fields);
}

/** Parses a route's numeric id; anything else is a plain 404, as for a missing record. */
export function parseId(value: unknown, what = 'That record'): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0 || id > maxRecordId) {
    throw new HttpError(404, 'not_found', `${what} was not found.`);
  }
  return id;
}
