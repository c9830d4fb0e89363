/** An error the API answers as `{ error: { code, message, fields? } }` with its HTTP status. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly headers?: Record<string, string>,
    /** Structured detail a client can show, e.g. every bad row of an import. */
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That record') => new HttpError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const conflict = (message: string) => new HttpError(409, 'conflict', message);
export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'validation_failed', message, fields);
