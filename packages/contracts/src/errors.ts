import { z } from 'zod';

/** Every error the API answers has this shape. */
export const ApiError = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    details: z.unknown().optional(),
    // The request's id (also in the X-Request-Id header and the server's log line).
    requestId: z.string().optional(),
  }),
});
export type ApiError = z.infer<typeof ApiError>;

/** Turns zod issues into one message per field, keyed by the dotted path. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}
