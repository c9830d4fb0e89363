// The cluster set-up from checkouts where users really put them: under a 0700 folder (root's
// home), a path with spaces, a path too long for a Unix socket. Real initdb, start, query, stop.
import { chmodSync, mkdirSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { clusterDirs, ownedDir, reachableBy, SHARED_CLUSTER_ROOT } from './clusterDirs';
import { checkClusterMajor, installedMajors, postgresCluster } from './postgres';
import { isRoot } from './system';

// mkdtemp makes a 0700 folder; open it, so that each case sets the mode that matters itself.
const scratch = mkdtempSync(path.join(os.tmpdir(), 'kerfmark-setup-'));
chmodSync(scratch, 0o755);
const sharedRoot = path.join(scratch, 'shared');
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** A checkout folder inside a parent of the given mode, as `git clone` would leave it. */
function checkout(parentName: string, mode: number, name = 'kerfmark'): string {
  const parent = path.join(scratch, parentName);
  mkdirSync(parent, { recursive: true, mode });
  const root = path.join(parent, name);
  mkdirSync(root, { recursive: true });
  return root;
}

describe('where a cluster lives', () => {
  it.runIf(isRoot)('makes every missing level its user can enter, not only the last', () => {
    const dir = path.join(scratch, 'owned', 'a', 'b');
    ownedDir(dir, 'postgres');
    expect(reachableBy(dir, 'postgres')).toBe(true);
    expect(statSync(path.join(scratch, 'owned', 'a')).mode & 0o777).toBe(0o755);
    expect(statSync(dir).mode & 0o777).toBe(0o700);
  });

  it.runIf(isRoot)(
    'moves the data out of a checkout the postgres user cannot reach, to a kept folder it owns, and says why',
    () => {
      const root = checkout('private', 0o700);
      const dirs = clusterDirs({
        baseDir: path.join(root, '.data/test'),
        name: 'test',
        checkoutRoot: root,
        user: 'postgres',
        sharedRoot,
      });
      expect(dirs.data.startsWith(sharedRoot)).toBe(true);
      expect(dirs.movedBecause).toContain('cannot reach');
      expect(reachableBy(dirs.data, 'postgres') && reachableBy(dirs.run, 'postgres')).toBe(true);
    },
  );

  it('keeps the data under the checkout when the server can reach it', () => {
    const root = checkout('open folder with spaces', 0o755);
    const baseDir = path.join(root, '.data/test');
    const dirs = clusterDirs({
      baseDir,
      name: 'test',
      checkoutRoot: root,
      user: isRoot ? 'postgres' : null,
      sharedRoot,
    });
    expect(dirs).toEqual({ data: path.join(baseDir, 'pg'), run: path.join(baseDir, 'pg-run') });
  });

  it('puts the socket in a short folder when the checkout path is too long for a Unix socket', () => {
    // sun_path holds 108 bytes on Linux (unix(7)); this folder alone is longer.
    const root = checkout('long', 0o755, 'k'.repeat(120));
    const dirs = clusterDirs({
      baseDir: path.join(root, '.data/test'),
      name: 'test',
      checkoutRoot: root,
      user: isRoot ? 'postgres' : null,
      sharedRoot,
    });
    expect(dirs.data.startsWith(root)).toBe(true);
    expect(dirs.run.length).toBeLessThan(90);
  });
});

describe('the server version', () => {
  it('finds the installed majors, newest first', () => {
    const root = path.join(scratch, 'pgroot');
    for (const v of ['15', '17', 'common']) mkdirSync(path.join(root, v, 'bin'), { recursive: true });
    for (const v of ['15', '17']) writeFileSync(path.join(root, v, 'bin/initdb'), '');
    expect(installedMajors(root)).toEqual([17, 15]);
  });

  it('refuses a cluster an older major made, saying what to do, and leaves it as it was', () => {
    const dir = path.join(scratch, 'old-cluster');
    mkdirSync(dir, { recursive: true });
    writeFileSync(path.join(dir, 'PG_VERSION'), '15\n');
    expect(() => checkClusterMajor(dir, 17)).toThrow(
      /made by PostgreSQL 15.*runs PostgreSQL 17.*remove that folder.*pg_upgrade/s,
    );
    expect(statSync(path.join(dir, 'PG_VERSION')).size).toBe(3);
    expect(() => checkClusterMajor(dir, 15)).not.toThrow();
  });
});

/** A cluster made outside the scratch folder (the kept folder, a short socket folder) goes with it. */
function removeCluster(cluster: { dataDir: string; runDir: string }) {
  for (const dir of [cluster.dataDir, cluster.runDir]) rmSync(dir, { recursive: true, force: true });
  if (cluster.dataDir.startsWith(SHARED_CLUSTER_ROOT))
    rmSync(path.dirname(cluster.dataDir), { recursive: true, force: true });
}

describe('a real cluster from awkward checkouts', () => {
  for (const [label, parent, mode, name] of [
    ['under a 0700 folder', 'home', 0o700, 'kerfmark'],
    ['on a path with spaces', 'my work', 0o755, 'kerf mark'],
    ['on a path too long for a socket', 'deep', 0o755, 'd'.repeat(110)],
  ] as const) {
    it(`initdb, start, query and stop ${label}`, async () => {
      const root = checkout(parent, mode, name);
      const port = await freePort();
      const cluster = postgresCluster({
        baseDir: path.join(root, '.data/test'),
        name: `t${port}`,
        port,
        forTests: true,
        checkoutRoot: root,
      });
      try {
        await cluster.start();
        const client = new pg.Client({ host: '127.0.0.1', port, user: 'kerfmark', database: 'postgres' });
        await client.connect();
        expect((await client.query('select 1 + 1 as two')).rows[0].two).toBe(2);
        await client.end();
      } finally {
        await cluster.stop();
        removeCluster(cluster);
      }
    });
  }

  it('refuses a PostgreSQL port that something else holds, naming the variable that moves it', async () => {
    const root = checkout('ports', 0o755);
    const squatter = net.createServer().listen(0, '127.0.0.1');
    await new Promise((r) => squatter.once('listening', r));
    const { port } = squatter.address() as net.AddressInfo;
    const cluster = postgresCluster({
      baseDir: path.join(root, '.data/test'),
      name: `p${port}`,
      port,
      forTests: true,
      checkoutRoot: root,
      portVariable: 'KERFMARK_TEST_PG_PORT',
    });
    try {
      await expect(cluster.start()).rejects.toThrow(`Port ${port} for PostgreSQL is already in use`);
      await expect(cluster.start()).rejects.toThrow('KERFMARK_TEST_PG_PORT');
    } finally {
      squatter.close();
      removeCluster(cluster);
    }
  });
});
