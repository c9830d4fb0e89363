import { execFile, spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { promisify } from 'node:util';
import { Redis } from 'ioredis';
import { redisOptions } from '@kerfmark/contracts';
import { ensureDatabase } from '../../../../scripts/lib/postgres';
import { repoRoot } from '../../../../scripts/lib/profile';
import { bindModels, createKnex } from '../db/knex';

/*
 * The API and the worker as the processes production runs (`apps/api/src/server.ts`,
 * `apps/worker/src/index.ts`), each test file with a database of its own on the test cluster
 * and a redis-server of its own on a free port, so that the test stack's worker (which sweeps
 * the shared test database) cannot do the work in their place.
 */
const TSX = path.join(repoRoot, 'node_modules/tsx/dist/cli.mjs');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** Polls until `check` gives a value, or fails naming what was awaited. */
export async function until<T>(
  what: string,
  check: () => Promise<T | undefined | false>,
  timeoutMs = 20_000,
): Promise<T> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const value = await check().catch(() => undefined);
    if (value) return value;
    await sleep(100);
  }
  throw new Error(`${what}: not within ${timeoutMs / 1000} s`);
}

export interface Run {
  child: ChildProcess;
  output: () => string;
  exited: Promise<number | null>;
}

/** The processes a test file started, the servers and the database it made, all undone by `close()`. */
export class ProcessHarness {
  private readonly children: ChildProcess[] = [];
  private readonly closers: Array<() => Promise<unknown>> = [];

  /** Starts an app process with the test stack's environment and the overrides given. */
  start(entry: string, env: Record<string, string | undefined>): Run {
    // Node runs the entry itself with tsx's loader: through tsx's command there would be a second
    // process, which a kill of the first leaves running after the tests.
    const child = spawn(process.execPath, ['--import', 'tsx', entry], {
      cwd: repoRoot,
      env: { ...process.env, ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    this.children.push(child);
    let output = '';
    child.stdout!.on('data', (chunk) => (output += chunk));
    child.stderr!.on('data', (chunk) => (output += chunk));
    const exited = once(child, 'exit').then(([code]) => code as number | null);
    return { child, output: () => output, exited };
  }

  /** Debian's redis-server on a free port, nothing saved; `args` add e.g. users and passwords. `url` builds the clients' URL. */
  async redis(url: (port: number) => string, args: string[] = []): Promise<string> {
    const port = await freePort();
    const server = spawn(
      '/usr/bin/redis-server',
      [
        '--port',
        String(port),
        '--bind',
        '127.0.0.1',
        '--save',
        '',
        '--appendonly',
        'no',
        '--dir',
        os.tmpdir(),
        ...args,
      ],
      { stdio: 'ignore' },
    );
    this.closers.push(async () => {
      server.kill('SIGTERM');
      if (server.exitCode === null) await once(server, 'exit');
    });
    const redisUrl = url(port);
    const probe = new Redis({
      ...redisOptions(redisUrl),
      lazyConnect: true,
      maxRetriesPerRequest: 0,
      retryStrategy: () => null,
    });
    probe.on('error', () => undefined); // refused until the server is up
    await until('redis-server answers', async () => {
      await probe.connect().catch(() => undefined);
      return (await probe.ping()) === 'PONG';
    });
    probe.disconnect();
    return redisUrl;
  }

  /** A fresh, migrated database of this name on the test stack's cluster, with the models bound to it. */
  async database(name: string): Promise<{ databaseUrl: string; knex: ReturnType<typeof createKnex> }> {
    const stackDb = new URL(process.env.DATABASE_URL!);
    const databaseUrl = `postgres://kerfmark@127.0.0.1:${stackDb.port}/${name}`;
    await ensureDatabase(Number(stackDb.port), name, true);
    // knex loads the .ts migrations with Node's import(), which vitest's module runner does not serve.
    await promisify(execFile)(process.execPath, [TSX, 'scripts/migrate.ts'], {
      cwd: repoRoot,
      env: { ...process.env, DATABASE_URL: databaseUrl },
    });
    const knex = createKnex(databaseUrl);
    bindModels(knex); // each test file runs in a vitest worker of its own
    this.closers.push(() => knex.destroy());
    return { databaseUrl, knex };
  }

  async close(): Promise<void> {
    for (const child of this.children) if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
    for (const close of this.closers.reverse()) await close().catch(() => undefined);
  }
}
