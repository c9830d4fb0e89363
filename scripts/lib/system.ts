import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const isRoot = process.getuid?.() === 0;
let aptUpdated = false;

/**
 * Makes sure a Debian package's program is on this machine: installs it with apt-get when we
 * are root, and otherwise stops with a message saying what to install.
 */
export function ensureDebianPackage(program: string, pkg: string, why: string): void {
  if (existsSync(program)) return;
  if (!isRoot) {
    throw new Error(`${why} needs ${program}. Install it with: sudo apt-get install -y ${pkg}`);
  }
  console.log(`· installing ${pkg} (${why}) with apt-get …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
    aptUpdated = true;
  }
  execFileSync('apt-get', ['install', '-y', '-qq', pkg], { stdio: 'inherit', env });
  if (!existsSync(program)) throw new Error(`apt-get installed ${pkg} but ${program} is still missing`);
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
