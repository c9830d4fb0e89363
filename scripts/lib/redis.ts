import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { assertPortFree } from './net';
import { portVariable, type Profile } from './profile';
import { ensureDebianPackage, run } from './system';

const REDIS = '/usr/bin/redis-server';

export interface RedisHandle {
  stop(): Promise<void>;
}

/** One redis-server of our own, on its own port and folder. */
export interface RedisServer extends RedisHandle {
  readonly port: number;
  /**
   * Starts the server unless ours is running (it answers PING a moment later). A port held by
   * anything else is refused, naming `portVariable`: another program's Redis is never used.
   */
  start(portVariable?: string): Promise<void>;
  /** Stops the server and waits (up to 10 s) until it has exited. */
  stop(): Promise<void>;
}

function pidAlive(pidFile: string): number | null {
  if (!existsSync(pidFile)) return null;
  const pid = Number(readFileSync(pidFile, 'utf8').trim());
  try {
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

/** Debian's redis-server on loopback, nothing saved: PostgreSQL is the source of truth. */
export function redisServer(opts: { port: number; dir: string }): RedisServer {
  ensureDebianPackage(REDIS, 'redis-server', 'The job queue (BullMQ on Redis)');
  mkdirSync(opts.dir, { recursive: true });
  const pidFile = path.join(opts.dir, 'redis.pid');
  return {
    port: opts.port,
    async start(variable = 'the Redis port') {
      if (pidAlive(pidFile)) return;
      await assertPortFree(opts.port, 'Redis', variable);
      run(REDIS, [
        '--port',
        String(opts.port),
        '--bind',
        '127.0.0.1',
        '--save',
        '',
        '--appendonly',
        'no',
        '--daemonize',
        'yes',
        '--pidfile',
        pidFile,
        '--dir',
        opts.dir,
        '--logfile',
        path.join(opts.dir, 'redis.log'),
      ]);
      // The daemon writes its pid file a moment after the fork: until then it is not known as ours.
      for (let waited = 0; !pidAlive(pidFile); waited += 50) {
        if (waited > 5_000) throw new Error(`redis-server did not start; see ${path.join(opts.dir, 'redis.log')}`);
        await sleep(50);
      }
    },
    async stop() {
      const pid = pidAlive(pidFile);
      if (!pid) return;
      process.kill(pid, 'SIGTERM');
      for (let waited = 0; waited < 10_000 && pidAlive(pidFile) === pid; waited += 50) await sleep(50);
    },
  };
}

export async function startRedis(p: Profile): Promise<RedisHandle> {
  const server = redisServer({ port: p.ports.redis, dir: path.join(p.dataDir, 'redis') });
  await server.start(portVariable(p, 'redis'));
  return server;
}
