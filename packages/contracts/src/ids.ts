import { z } from 'zod';

/**
 * The largest id a record can have: ids are PostgreSQL `integer` columns (4 bytes, signed), and a
 * larger number in a query is an error of the database, not a record that is missing.
 */
export const maxRecordId = 2_147_483_647;

/** A record's id in a body or a filter: a whole number from 1 to `maxRecordId`; `number` is `z.number()` or `z.coerce.number()`. */
export function recordId<N extends z.ZodNumber | z.ZodCoercedNumber>(number: N, message: string): N {
  // Each check returns the schema it was called on, so the coerced kind stays coerced.
  return number.int().positive().max(maxRecordId, message) as N;
}
