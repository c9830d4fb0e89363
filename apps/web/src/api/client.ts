import type { ApiError } from '@kerfmark/contracts';

/** An error answered by the API (or a network failure, status 0), with its field messages. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
  }
}

let tokenSource: () => string | null = () => null;
let onUnauthorised: () => void = () => undefined;

/** The auth store tells the client where the token is and what to do when it stops working. */
export function configureClient(opts: { token: () => string | null; unauthorised: () => void }): void {
  tokenSource = opts.token;
  onUnauthorised = opts.unauthorised;
}

export async function api<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const token = tokenSource();
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method: init.method ?? 'GET',
      headers: {
        Accept: 'application/json',
        ...(init.body !== undefined ? { 'Content-Type': 'application/json' } : {}),
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
      },
      body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
    });
  } catch {
    throw new ApiRequestError(0, 'network', 'Kerfmark cannot be reached. Check your connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const body = (await response.json().catch(() => null)) as (T & Partial<ApiError>) | null;
  if (!response.ok) {
    const error = body?.error;
    if (response.status === 401 && token) onUnauthorised();
    throw new ApiRequestError(
      response.status,
      error?.code ?? 'unknown',
      error?.message ?? `The server answered ${response.status}.`,
      error?.fields ?? {},
    );
  }
  return body as T;
}
