import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdirSync } from 'node:fs';
import path from 'node:path';
import readline from 'node:readline';
import { repoRoot } from './profile';

interface Managed {
  name: string;
  child: ChildProcess;
}

/**
 * Starts the app processes, prefixes their output, keeps a log of each, and stops them all
 * (then the services) on Ctrl-C or when one of them dies.
 */
export class Supervisor {
  private readonly children: Managed[] = [];
  private readonly cleanups: Array<() => void | Promise<void>> = [];
  private stopping = false;

  constructor(
    private readonly logDir: string,
    private readonly opts: { echo: boolean },
  ) {
    mkdirSync(logDir, { recursive: true });
  }

  onStop(cleanup: () => void | Promise<void>): void {
    this.cleanups.push(cleanup);
  }

  /** Runs a workspace's TypeScript entry point with tsx, as its own process. */
  start(name: string, entry: string, env: Record<string, string>): ChildProcess {
    const tsx = path.join(repoRoot, 'node_modules/tsx/dist/cli.mjs');
    return this.spawn(name, process.execPath, [tsx, entry], env);
  }

  spawn(name: string, cmd: string, args: string[], env: Record<string, string>): ChildProcess {
    const child = spawn(cmd, args, {
      cwd: repoRoot,
      env: { ...process.env, ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    mkdirSync(this.logDir, { recursive: true });
    const log = createWriteStream(path.join(this.logDir, `${name}.log`), { flags: 'a' });
    for (const stream of [child.stdout, child.stderr]) {
      readline.createInterface({ input: stream! }).on('line', (line) => {
        log.write(`${line}\n`);
        if (this.opts.echo) console.log(`[${name}] ${line}`);
      });
    }
    child.on('exit', (code, signal) => {
      if (this.stopping) return;
      console.error(
        `\n${name} stopped unexpectedly (${signal ?? `exit ${code}`}); see ${path.join(this.logDir, `${name}.log`)}`,
      );
      void this.stopAll(1);
    });
    this.children.push({ name, child });
    return child;
  }

  /** Stops one process on purpose (fault tests use this), without taking the rest down. */
  async stopOne(name: string): Promise<void> {
    const index = this.children.findIndex((c) => c.name === name);
    if (index < 0) return;
    const [managed] = this.children.splice(index, 1);
    managed!.child.removeAllListeners('exit');
    await stopChild(managed!.child);
  }

  async stopAll(exitCode?: number): Promise<void> {
    if (this.stopping) return;
    this.stopping = true;
    await Promise.all(this.children.reverse().map(({ child }) => stopChild(child)));
    for (const cleanup of this.cleanups.reverse()) {
      try {
        await cleanup();
      } catch (error) {
        console.error(`while stopping: ${(error as Error).message}`);
      }
    }
    if (exitCode !== undefined) process.exit(exitCode);
  }

  handleSignals(): void {
    for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
      process.once(signal, () => {
        console.log('\nStopping Kerfmark …');
        void this.stopAll(0);
      });
    }
  }
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill('SIGKILL'), 5000);
    child.once('exit', () => {
      clearTimeout(force);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
