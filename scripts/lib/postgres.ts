import { execFile } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import { clusterDirs } from './clusterDirs';
import { assertPortFree } from './net';
import { portVariable, repoRoot, type Profile } from './profile';
import { asUser, ensureDebianPackage, isRoot, run } from './system';

const PG_ROOT = '/usr/lib/postgresql';
const RUN_AS = isRoot ? 'postgres' : null;
const execFileAsync = promisify(execFile);

/** The installed server majors, newest first (15 on Debian 12, 17 on Debian 13, or several). */
export function installedMajors(root = PG_ROOT): number[] {
  if (!existsSync(root)) return [];
  return readdirSync(root)
    .filter((v) => /^\d+$/.test(v) && existsSync(path.join(root, v, 'bin/initdb')))
    .map(Number)
    .sort((a, b) => b - a);
}

/** The newest installed server's bin folder; Debian's `postgresql` package is installed when there is none. */
function binDir(): { bin: string; major: number } {
  // Guarded: a bare install when a server exists would upgrade it.
  ensureDebianPackage(() => installedMajors().length > 0, 'postgresql', 'The database (PostgreSQL)');
  const major = installedMajors()[0]!;
  return { bin: path.join(PG_ROOT, String(major), 'bin'), major };
}

/**
 * Refuses a cluster that an older (or newer) server major made: reusing it fails to start,
 * and removing it would lose the data, so say what to do instead.
 */
export function checkClusterMajor(dataDir: string, serverMajor: number): void {
  const versionFile = path.join(dataDir, 'PG_VERSION');
  if (!existsSync(versionFile)) return;
  const clusterMajor = Number(readFileSync(versionFile, 'utf8').trim());
  if (clusterMajor === serverMajor) return;
  throw new Error(
    `The PostgreSQL cluster in ${dataDir} was made by PostgreSQL ${clusterMajor}, and this machine runs PostgreSQL ${serverMajor}. ` +
      `Nothing was changed. For a fresh demo, remove that folder and start again; to keep its data, upgrade it with ` +
      `pg_upgrade (or install postgresql-${clusterMajor} beside the newer server and dump and restore).`,
  );
}

export interface PostgresHandle {
  stop(): Promise<void>;
}

/** One PostgreSQL server of our own: its own data folder and port, run as the postgres user when we are root. */
export interface PostgresCluster extends PostgresHandle {
  readonly port: number;
  readonly dataDir: string;
  /** Where its socket and log are. */
  readonly runDir: string;
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
export function postgresCluster(opts: {
  baseDir: string;
  name: string;
  port: number;
  forTests: boolean;
  checkoutRoot?: string;
  portVariable?: string;
}): PostgresCluster {
  const { bin, major } = binDir();
  const dirs = clusterDirs({
    baseDir: opts.baseDir,
    name: opts.name,
    checkoutRoot: opts.checkoutRoot ?? repoRoot,
    user: RUN_AS,
  });
  if (dirs.movedBecause) console.log(`· PostgreSQL data for ${opts.name} is in ${dirs.data}: ${dirs.movedBecause}`);
  checkClusterMajor(dirs.data, major);
  const pgCtl = (args: string[]) =>
    execFileAsync(...asUser(RUN_AS, path.join(bin, 'pg_ctl'), ['-D', dirs.data, ...args]));
  const running = () =>
    pgCtl(['status']).then(
      () => true,
      () => false,
    );

  if (!existsSync(path.join(dirs.data, 'PG_VERSION'))) {
    console.log(`· creating the PostgreSQL cluster in ${dirs.data}`);
    run(
      ...asUser(RUN_AS, path.join(bin, 'initdb'), [
        '-D',
        dirs.data,
        '-A',
        'trust',
        '-U',
        'kerfmark',
        '-E',
        'UTF8',
        '--no-locale',
      ]),
      {
        quiet: true,
      },
    );
  }
  return {
    port: opts.port,
    dataDir: dirs.data,
    runDir: dirs.run,
    async start() {
      if (await running()) return;
      // Our own server is not running, so anything on the port is someone else's: never use it.
      await assertPortFree(opts.port, 'PostgreSQL', opts.portVariable ?? 'the PostgreSQL port');
      const options = [
        `-p ${opts.port}`,
        // pg_ctl hands -o to a shell: quote the folder, which may hold spaces.
        `-k ${shellQuote(dirs.run)}`,
        '-c listen_addresses=127.0.0.1',
        // Random reads cost about what sequential ones do on SSD or a cache-resident data set; the
        // default (4, for spinning disks) has the planner scan a whole table rather than fetch 25 rows by key.
        '-c random_page_cost=1.1',
        ...(opts.forTests ? ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'] : []),
      ].join(' ');
      await pgCtl(['-l', path.join(dirs.run, 'postgres.log'), '-o', options, '-w', '-t', '30', 'start']).catch(
        failed('start'),
      );
    },
    async stop() {
      if (await running()) await pgCtl(['-m', 'fast', '-w', 'stop']).catch(failed('stop'));
    },
  };
}

function shellQuote(text: string): string {
  return `'${text.replaceAll("'", "'\\''")}'`;
}

function failed(what: string) {
  return (error: Error & { stdout?: string; stderr?: string }) => {
    const output = `${error.stdout ?? ''}${error.stderr ?? ''}`.trim();
    throw new Error(`pg_ctl ${what} failed${output ? `:\n${output}` : `: ${error.message}`}`);
  };
}

export async function startPostgres(p: Profile, opts: { fresh?: boolean } = {}): Promise<PostgresHandle> {
  const cluster = postgresCluster({
    baseDir: p.dataDir,
    name: p.name,
    port: p.ports.postgres,
    forTests: p.name === 'test',
    portVariable: portVariable(p, 'postgres'),
  });
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
