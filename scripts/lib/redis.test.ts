// The checkout's Redis is its own: a port that another program's server holds is refused by
// name, never used, and the checkout's own running server is reused.
import { mkdtempSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { portIsFree } from './net';
import { redisServer } from './redis';

const scratch = mkdtempSync(path.join(os.tmpdir(), 'kerfmark-redis-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function listen(): Promise<net.Server> {
  const server = net.createServer((socket) => socket.end('+PONG\r\n')).listen(0, '127.0.0.1');
  return new Promise((resolve) => server.once('listening', () => resolve(server)));
}

describe('the checkout’s Redis', () => {
  it('refuses a port that something else answers on, naming the variable that moves it', async () => {
    // The stand-in even answers PING, as a foreign Redis would.
    const foreign = await listen();
    const { port } = foreign.address() as net.AddressInfo;
    try {
      const server = redisServer({ port, dir: path.join(scratch, 'foreign') });
      await expect(server.start('KERFMARK_TEST_REDIS_PORT')).rejects.toThrow(
        `Port ${port} for Redis is already in use. Stop whatever holds it (another Kerfmark?) or set KERFMARK_TEST_REDIS_PORT.`,
      );
    } finally {
      foreign.close();
    }
  });

  it('starts its own, reuses it while it runs, and frees the port when stopped', async () => {
    const probe = await listen();
    const { port } = probe.address() as net.AddressInfo;
    await new Promise((r) => probe.close(r));
    const server = redisServer({ port, dir: path.join(scratch, 'own') });
    try {
      await server.start();
      await server.start(); // ours is running: no second server, no refusal
      expect(await portIsFree(port)).toBe(false);
    } finally {
      await server.stop();
    }
    expect(await portIsFree(port)).toBe(true);
  });
});
