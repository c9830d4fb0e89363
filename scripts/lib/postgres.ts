import { chownSync, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { createHash } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import type { Profile } from './profile';
import { repoRoot } from './profile';
import { asUser, ensureDebianPackage, isRoot, run, succeeds } from './system';

const PG_ROOT = '/usr/lib/postgresql';
const RUN_AS = isRoot ? 'postgres' : null;
// A Unix socket path over about 107 bytes cannot be created.
const MAX_SOCKET_DIR = 90;

function binDir(): string {
  const versions = existsSync(PG_ROOT)
    ? readdirSync(PG_ROOT).filter((v) => existsSync(path.join(PG_ROOT, v, 'bin/initdb')))
    : [];
  if (versions.length === 0) {
    // Guarded: a bare install when a server exists would upgrade it.
    ensureDebianPackage(`${PG_ROOT}/15/bin/initdb`, 'postgresql', 'The database (PostgreSQL)');
    return binDir();
  }
  const newest = versions.sort((a, b) => Number(b) - Number(a))[0]!;
  return path.join(PG_ROOT, newest, 'bin');
}

function ownedDir(dir: string): string {
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (RUN_AS) {
    const uid = Number(run('id', ['-u', RUN_AS], { quiet: true }).trim());
    const gid = Number(run('id', ['-g', RUN_AS], { quiet: true }).trim());
    chownSync(dir, uid, gid);
  }
  return dir;
}

function reachable(dir: string): boolean {
  if (!RUN_AS) return true;
  return succeeds('runuser', ['-u', RUN_AS, '--', 'test', '-w', dir, '-a', '-x', dir]);
}

/** Where the cluster lives: under the checkout's ignored .data, or a temp folder when that is unreachable. */
function clusterDirs(p: Profile): { data: string; run: string } {
  const local = { data: path.join(p.dataDir, 'pg'), run: path.join(p.dataDir, 'pg-run') };
  const key = createHash('sha256').update(repoRoot).digest('hex').slice(0, 10);
  const temp = path.join(os.tmpdir(), `kerfmark-${key}-${p.name}`);
  const fallback = { data: path.join(temp, 'pg'), run: path.join(temp, 'run') };
  let dirs = local;
  try {
    ownedDir(local.data);
    if (!reachable(local.data)) dirs = fallback;
  } catch {
    dirs = fallback;
  }
  if (dirs.run.length > MAX_SOCKET_DIR) dirs = { ...dirs, run: path.join(fallback.run) };
  ownedDir(dirs.data);
  ownedDir(dirs.run);
  return dirs;
}

export interface PostgresHandle {
  stop(): void;
}

export async function startPostgres(p: Profile, opts: { fresh?: boolean } = {}): Promise<PostgresHandle> {
  const bin = binDir();
  const dirs = clusterDirs(p);
  const pgCtl = path.join(bin, 'pg_ctl');
  const user = (args: string[], cmd = pgCtl) => asUser(RUN_AS, cmd, args);

  if (!existsSync(path.join(dirs.data, 'PG_VERSION'))) {
    console.log(`· creating the PostgreSQL cluster in ${dirs.data}`);
    run(...user(['-D', dirs.data, '-A', 'trust', '-U', 'kerfmark', '-E', 'UTF8', '--no-locale'], path.join(bin, 'initdb')), {
      quiet: true,
    });
  }

  const running = succeeds(...user(['-D', dirs.data, 'status']));
  if (!running) {
    const options = [
      `-p ${p.ports.postgres}`,
      `-k ${dirs.run}`,
      '-c listen_addresses=127.0.0.1',
      ...(p.name === 'test' ? ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'] : []),
    ].join(' ');
    run(...user(['-D', dirs.data, '-l', path.join(dirs.run, 'postgres.log'), '-o', options, '-w', '-t', '30', 'start']), {
      quiet: true,
    });
  }

  await ensureDatabase(p, opts.fresh ?? false);
  return {
    stop: () => {
      if (succeeds(...user(['-D', dirs.data, 'status']))) {
        run(...user(['-D', dirs.data, '-m', 'fast', '-w', 'stop']), { quiet: true });
      }
    },
  };
}

async function ensureDatabase(p: Profile, fresh: boolean): Promise<void> {
  const client = new pg.Client({ host: '127.0.0.1', port: p.ports.postgres, user: 'kerfmark', database: 'postgres' });
  await client.connect();
  try {
    const name = client.escapeIdentifier(p.database);
    if (fresh) await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [p.database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE ${name}`);
  } finally {
    await client.end();
  }
}
