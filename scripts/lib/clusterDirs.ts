import { chownSync, existsSync, mkdirSync, statSync } from 'node:fs';
import { createHash } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import { run, succeeds } from './system';

// A Unix socket path over about 107 bytes cannot be created (sun_path); leave room for the file name.
const MAX_SOCKET_DIR = 90;
/** Where clusters go when the server's user cannot reach the checkout: kept across reboots, unlike /tmp. */
export const SHARED_CLUSTER_ROOT = '/var/lib/kerfmark';

export interface ClusterDirs {
  data: string;
  run: string;
  /** Why the data is not under the checkout, when it is not. */
  movedBecause?: string;
}

function ids(user: string): { uid: number; gid: number } {
  return {
    uid: Number(run('id', ['-u', user], { quiet: true }).trim()),
    gid: Number(run('id', ['-g', user], { quiet: true }).trim()),
  };
}

/**
 * Makes `dir` and every missing folder above it, each owned by `user` (when given) and mode
 * 0700 for the last, 0755 for those above: a root-owned 0700 parent would shut the user out
 * even of a child it owns.
 */
export function ownedDir(dir: string, user: string | null): string {
  const missing: string[] = [];
  for (let d = path.resolve(dir); !existsSync(d); d = path.dirname(d)) missing.unshift(d);
  const owner = user ? ids(user) : null;
  for (const d of missing) {
    mkdirSync(d, { mode: d === missing.at(-1) ? 0o700 : 0o755 });
    if (owner) chownSync(d, owner.uid, owner.gid);
  }
  if (owner && statSync(dir).uid !== owner.uid) chownSync(dir, owner.uid, owner.gid);
  return dir;
}

/** Whether `user` can enter and write `dir` (every folder above it must let it through). */
export function reachableBy(dir: string, user: string | null): boolean {
  if (!user) return true;
  return succeeds('runuser', ['-u', user, '--', 'test', '-w', dir, '-a', '-x', dir]);
}

/**
 * Where a cluster lives: `pg` and `pg-run` under `baseDir` (an ignored folder of the checkout)
 * when `user` (the server's user) can reach it; otherwise under SHARED_CLUSTER_ROOT, in a folder
 * named for the checkout and the cluster, owned by that user all the way down. The socket folder
 * moves to a short one under the temp dir when its path would be too long for a Unix socket.
 */
export function clusterDirs(opts: {
  baseDir: string;
  name: string;
  checkoutRoot: string;
  user: string | null;
  sharedRoot?: string;
}): ClusterDirs {
  const key = createHash('sha256').update(opts.checkoutRoot).digest('hex').slice(0, 10);
  const local: ClusterDirs = { data: path.join(opts.baseDir, 'pg'), run: path.join(opts.baseDir, 'pg-run') };
  let dirs = local;
  try {
    mkdirSync(opts.baseDir, { recursive: true });
    ownedDir(local.data, opts.user);
    if (!reachableBy(local.data, opts.user))
      dirs = { ...shared(), movedBecause: `the ${opts.user} user cannot reach ${opts.baseDir}` };
  } catch (error) {
    dirs = { ...shared(), movedBecause: `${opts.baseDir} cannot be used (${(error as Error).message.split('\n')[0]})` };
  }
  function shared(): ClusterDirs {
    const home = path.join(opts.sharedRoot ?? SHARED_CLUSTER_ROOT, `${key}-${opts.name}`);
    return { data: path.join(home, 'pg'), run: path.join(home, 'run') };
  }
  if (dirs.run.length > MAX_SOCKET_DIR) dirs = { ...dirs, run: path.join(os.tmpdir(), `kerfmark-${key}-${opts.name}`) };
  ownedDir(dirs.data, opts.user);
  ownedDir(dirs.run, opts.user);
  return dirs;
}
