import { execFile } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { createHash } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import type { Profile } from './profile';
import { repoRoot } from './profile';
import { asUser, ensureDebianPackage, isRoot, run, succeeds } from './system';

const PG_ROOT = '/usr/lib/postgresql';
const RUN_AS = isRoot ? 'postgres' : null;
const execFileAsync = promisify(execFile);
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

/**
 * Where a cluster lives: `pg` and `pg-run` under `baseDir` (an ignored folder of the checkout),
 * or a temp folder named for the checkout and `name` when the postgres user cannot reach it.
 */
function clusterDirs(baseDir: string, name: string): { data: string; run: string } {
  const local = { data: path.join(baseDir, 'pg'), run: path.join(baseDir, 'pg-run') };
  const key = createHash('sha256').update(repoRoot).digest('hex').slice(0, 10);
  const temp = path.join(os.tmpdir(), `kerfmark-${key}-${name}`);
  const fallback = { data: path.join(temp, 'pg'), run: path.join(temp, 'run') };
  let dirs = local;
  try {
    mkdirSync(baseDir, { recursive: true });
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
  stop(): Promise<void>;
}

/** One PostgreSQL server of our own: its own data folder and port, run as the postgres user when we are root. */
export interface PostgresCluster extends PostgresHandle {
  readonly port: number;
  readonly dataDir: string;
  /** Starts the server unless it is running, and waits until it accepts connections. */
  start(): Promise<void>;
  /** Stops the server at once if it runs (fast shutdown: open sessions are ended). */
  stop(): Promise<void>;
}

/**
 * Creates the cluster on first use (trust for loopback, superuser kerfmark) and returns its
 * controls. `forTests` trades crash safety for speed: nothing in a test cluster must survive
 * a crash of the machine. pg_ctl runs without blocking the event loop, so a process may stop
 * and start its own cluster while it serves requests (the outage tests do).
 */
export function postgresCluster(opts: { baseDir: string; name: string; port: number; forTests: boolean }): PostgresCluster {
  const bin = binDir();
  const dirs = clusterDirs(opts.baseDir, opts.name);
  const pgCtl = (args: string[]) => execFileAsync(...asUser(RUN_AS, path.join(bin, 'pg_ctl'), ['-D', dirs.data, ...args]));
  const running = () => pgCtl(['status']).then(() => true, () => false);

  if (!existsSync(path.join(dirs.data, 'PG_VERSION'))) {
    console.log(`· creating the PostgreSQL cluster in ${dirs.data}`);
    run(...asUser(RUN_AS, path.join(bin, 'initdb'), ['-D', dirs.data, '-A', 'trust', '-U', 'kerfmark', '-E', 'UTF8', '--no-locale']), {
      quiet: true,
    });
  }
  return {
    port: opts.port,
    dataDir: dirs.data,
    async start() {
      if (await running()) return;
      const options = [
        `-p ${opts.port}`,
        `-k ${dirs.run}`,
        '-c listen_addresses=127.0.0.1',
        // Random reads cost about what sequential ones do on SSD or a cache-resident data set; the
        // default (4, for spinning disks) has the planner scan a whole table rather than fetch 25 rows by key.
        '-c random_page_cost=1.1',
        ...(opts.forTests ? ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'] : []),
      ].join(' ');
      await pgCtl(['-l', path.join(dirs.run, 'postgres.log'), '-o', options, '-w', '-t', '30', 'start']).catch(failed('start'));
    },
    async stop() {
      if (await running()) await pgCtl(['-m', 'fast', '-w', 'stop']).catch(failed('stop'));
    },
  };
}

function failed(what: string) {
  return (error: Error & { stdout?: string; stderr?: string }) => {
    const output = `${error.stdout ?? ''}${error.stderr ?? ''}`.trim();
    throw new Error(`pg_ctl ${what} failed${output ? `:\n${output}` : `: ${error.message}`}`);
  };
}

export async function startPostgres(p: Profile, opts: { fresh?: boolean } = {}): Promise<PostgresHandle> {
  const cluster = postgresCluster({ baseDir: p.dataDir, name: p.name, port: p.ports.postgres, forTests: p.name === 'test' });
  await cluster.start();
  await ensureDatabase(p.ports.postgres, p.database, opts.fresh ?? false);
  return { stop: () => cluster.stop() };
}

/** Creates the database on the cluster at `port` unless it exists; `fresh` drops it first. */
export async function ensureDatabase(port: number, database: string, fresh: boolean): Promise<void> {
  const client = new pg.Client({ host: '127.0.0.1', port, user: 'kerfmark', database: 'postgres' });
  await client.connect();
  try {
    const name = client.escapeIdentifier(database);
    if (fresh) await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE ${name}`);
  } finally {
    await client.end();
  }
}
