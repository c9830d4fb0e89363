import type { Server } from 'node:http';

/**
 * Stops an HTTP server the graceful way: no new connections, idle keep-alive connections closed
 * at once, requests in flight answered (then their connections closed), and whatever is still
 * open after `graceMs` cut off. Resolves when no connection is left.
 */
export function closeServer(server: Server, graceMs: number): Promise<void> {
  // An answer sent from now on asks the client not to reuse the connection.
  server.prependListener('request', (_req, res) => res.setHeader('Connection', 'close'));
  return new Promise((resolve) => {
    // close() drops the connections idle now; a keep-alive connection whose answer was already
    // under way turns idle only when it is sent, so keep dropping those as they come.
    const idle = setInterval(() => server.closeIdleConnections(), 50);
    const cutOff = setTimeout(() => server.closeAllConnections(), graceMs);
    server.close(() => {
      clearInterval(idle);
      clearTimeout(cutOff);
      resolve();
    });
  });
}
