import net from 'node:net';
import { setTimeout as sleep } from 'node:timers/promises';

export function portIsFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.listen(port, host, () => server.close(() => resolve(true)));
  });
}

export async function assertPortFree(port: number, what: string, envName: string): Promise<void> {
  if (!(await portIsFree(port))) {
    throw new Error(
      `Port ${port} for ${what} is already in use. Stop whatever holds it (another Kerfmark?) or set ${envName}.`,
    );
  }
}

/** Polls a check until it answers true, or fails with the service's name after the timeout. */
export async function waitFor(what: string, check: () => Promise<boolean>, timeoutMs = 30_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (await check().catch(() => false)) return;
    await sleep(100);
  }
  throw new Error(`${what} did not come up within ${timeoutMs / 1000} s`);
}

export async function httpOk(url: string): Promise<boolean> {
  const response = await fetch(url, { signal: AbortSignal.timeout(2000) });
  return response.ok;
}
