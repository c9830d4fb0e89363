import type { Server, ServerResponse } from 'node:http';

/**
 * Prepares an HTTP server for a graceful stop, and returns the function that stops it: no new
 * connections, idle keep-alive connections closed at once, requests in flight answered (with
 * `Connection: close`, so that their connections end too), and whatever is still open after
 * `graceMs` cut off. The returned promise resolves when no connection is left.
 */
export function gracefulClose(server: Server): (graceMs: number) => Promise<void> {
  const inFlight = new Set<ServerResponse>();
  let closing = false;
  // Prepended: it must run before the app, which may answer at once.
  server.prependListener('request', (_req, res) => {
    if (closing) res.setHeader('Connection', 'close');
    inFlight.add(res);
    res.once('close', () => inFlight.delete(res));
  });

  return (graceMs) =>
    new Promise((resolve) => {
      closing = true;
      for (const res of inFlight) if (!res.headersSent) res.setHeader('Connection', 'close');
      // close() drops only the connections idle now; one whose answer was already being sent
      // turns idle when it is done, so keep dropping those as they come.
      const idle = setInterval(() => server.closeIdleConnections(), 50);
      const cutOff = setTimeout(() => server.closeAllConnections(), graceMs);
      server.close(() => {
        clearInterval(idle);
        clearTimeout(cutOff);
        resolve();
      });
    });
}
