/** Why a dieline could not be analysed. Each code has one plain message for the user. */
export type DielineErrorCode =
  | 'EMPTY'
  | 'TOO_LARGE'
  | 'BINARY'
  | 'UNKNOWN_FORMAT'
  | 'UNSUPPORTED_FORMAT'
  | 'MALFORMED'
  | 'TRUNCATED'
  | 'TOO_MANY_ENTITIES'
  | 'NO_GEOMETRY'
  | 'NO_VECTORS'
  | 'ENCRYPTED'
  | 'BAD_OPTION';

export class DielineError extends Error {
  readonly code: DielineErrorCode;

  constructor(code: DielineErrorCode, message: string) {
    super(message);
    this.name = 'DielineError';
    this.code = code;
  }
}
