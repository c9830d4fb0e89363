import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { Profile } from './profile';
import { ensureDebianPackage, run } from './system';

const REDIS = '/usr/bin/redis-server';

export interface RedisHandle {
  stop(): void;
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
export function startRedis(p: Profile): RedisHandle {
  ensureDebianPackage(REDIS, 'redis-server', 'The job queue (BullMQ on Redis)');
  const dir = path.join(p.dataDir, 'redis');
  mkdirSync(dir, { recursive: true });
  const pidFile = path.join(dir, 'redis.pid');
  if (!pidAlive(pidFile)) {
    run(REDIS, [
      '--port', String(p.ports.redis),
      '--bind', '127.0.0.1',
      '--save', '',
      '--appendonly', 'no',
      '--daemonize', 'yes',
      '--pidfile', pidFile,
      '--dir', dir,
      '--logfile', path.join(dir, 'redis.log'),
    ]);
  }
  return {
    stop: () => {
      const pid = pidAlive(pidFile);
      if (pid) process.kill(pid, 'SIGTERM');
    },
  };
}
