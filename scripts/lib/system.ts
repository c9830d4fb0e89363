import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const isRoot = process.getuid?.() === 0;
let aptUpdated = false;

/** How long apt waits for another install (a fresh VM's unattended upgrades, say) to free the package lock. */
const APT_LOCK_WAIT_S = 600;

/**
 * Makes sure a Debian package's program is on this machine: installs it with apt-get when we
 * are root, and otherwise stops with a message saying what to install. `present` is a path
 * that must exist, or a check (PostgreSQL's server may be any major).
 */
export function ensureDebianPackage(present: string | (() => boolean), pkg: string, why: string): void {
  const installed = typeof present === 'string' ? () => existsSync(present) : present;
  if (installed()) return;
  if (!isRoot) {
    throw new Error(`${why} needs Debian's ${pkg} package. Install it with: sudo apt-get install -y ${pkg}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const lock = ['-o', `DPkg::Lock::Timeout=${APT_LOCK_WAIT_S}`];
  if (!aptUpdated) {
    console.log(
      `· reading Debian's package lists (apt-get update; waits up to ${APT_LOCK_WAIT_S / 60} min if another install holds the lock)`,
    );
    execFileSync('apt-get', [...lock, 'update', '-q'], { stdio: 'inherit', env });
    aptUpdated = true;
  }
  // Not quiet: apt's own lines (downloads, unpacking, setting up) are the progress of a long install.
  console.log(
    `· installing ${pkg} for ${why.charAt(0).toLowerCase()}${why.slice(1)} (apt-get install ${pkg}; waits for the package lock if needed)`,
  );
  execFileSync('apt-get', [...lock, 'install', '-y', pkg], { stdio: 'inherit', env });
  if (!installed())
    throw new Error(
      `apt-get installed ${pkg} but ${typeof present === 'string' ? present : 'its program'} is still missing`,
    );
  console.log(`· ${pkg} installed`);
}

/** Runs a command as the given user when we are root (PostgreSQL refuses to run as root). */
export function asUser(user: string | null, cmd: string, args: string[]): [string, string[]] {
  return user ? ['runuser', ['-u', user, '--', cmd, ...args]] : [cmd, args];
}

export function run(cmd: string, args: string[], opts: { quiet?: boolean } = {}): string {
  const result = spawnSync(cmd, args, { encoding: 'utf8' });
  if (result.status !== 0) {
    const output = `${result.stdout ?? ''}${result.stderr ?? ''}`.trim();
    throw new Error(`${cmd} ${args.join(' ')} failed${output ? `:\n${output}` : ''}`);
  }
  if (!opts.quiet && result.stdout.trim()) console.log(result.stdout.trim());
  return result.stdout;
}

export function succeeds(cmd: string, args: string[]): boolean {
  return spawnSync(cmd, args, { stdio: 'ignore' }).status === 0;
}
