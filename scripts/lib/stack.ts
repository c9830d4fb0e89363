import { execFileSync } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { prepareDatabase } from './database';
import { assertPortFree, httpOk, waitFor } from './net';
import { startPostgres } from './postgres';
import { portVariable, repoRoot, serviceEnv, type Profile } from './profile';
import { startRedis } from './redis';
import type { Supervisor } from './supervisor';

function redisAnswers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1', () => socket.write('PING\r\n'));
    socket.once('data', (data) => {
      socket.destroy();
      resolve(data.toString().startsWith('+PONG'));
    });
    socket.once('error', () => resolve(false));
  });
}

/**
 * Brings up a whole local Kerfmark for one profile: PostgreSQL, Redis, the S3 fake, the mail
 * catcher, migrations and demo data, the web build, the API and the worker.
 */
export async function bringUp(
  p: Profile,
  supervisor: Supervisor,
  opts: { fresh: boolean; productionSweeps?: boolean },
): Promise<Record<string, string>> {
  const env = serviceEnv(p);
  // Every port before anything starts; PostgreSQL's and Redis's are checked unless this checkout's own server runs there.
  await assertPortFree(p.ports.app, 'the app', portVariable(p, 'app'));
  await assertPortFree(p.ports.s3, 'the S3 fake', portVariable(p, 's3'));
  await assertPortFree(p.ports.smtp, 'the mail catcher (SMTP)', portVariable(p, 'smtp'));
  await assertPortFree(p.ports.mailUi, 'the mail catcher (inbox)', portVariable(p, 'mailUi'));

  step('PostgreSQL');
  const postgres = await startPostgres(p, { fresh: opts.fresh });
  supervisor.onStop(() => postgres.stop());

  step('Redis');
  const redis = await startRedis(p);
  supervisor.onStop(() => redis.stop());
  await waitFor('Redis', () => redisAnswers(p.ports.redis));

  step('S3 fake and mail catcher');
  supervisor.start('s3', 'infra/s3/server.ts', env);
  supervisor.start('mail', 'infra/mail/server.ts', env);

  await waitFor('the S3 fake', () => portAnswers(p.ports.s3));
  Object.assign(process.env, env);
  step('migrations and demo data');
  const applied = await prepareDatabase(env.DATABASE_URL!, { seed: true });
  if (applied.length) console.log(`  applied ${applied.length} migration(s)`);

  step('web app build');
  execFileSync(
    path.join(repoRoot, 'node_modules/.bin/turbo'),
    ['run', 'build', '--filter=@kerfmark/web', '--output-logs=errors-only'],
    {
      cwd: repoRoot,
      stdio: 'inherit',
      env: { ...process.env, TURBO_TELEMETRY_DISABLED: '1', DO_NOT_TRACK: '1' },
    },
  );

  await waitFor('the mail catcher', () => httpOk(`${env.MAIL_CATCHER_URL}/api/messages`));

  step('API and worker');
  supervisor.start('api', 'apps/api/src/server.ts', env);
  // Tests sweep every few seconds so that they need not wait; the benchmark keeps production's pace.
  const fast = p.name === 'test' && !opts.productionSweeps;
  const sweepMs = fast ? '2000' : '30000';
  supervisor.start('worker', 'apps/worker/src/index.ts', {
    ...env,
    OUTBOX_SWEEP_MS: sweepMs,
    ANALYSIS_SWEEP_MS: sweepMs,
    REMINDER_SWEEP_MS: fast ? '3000' : '300000',
  });
  await waitFor('the API', () => httpOk(`${env.APP_URL}/api/health`), 60_000);
  return env;
}

function portAnswers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

function step(what: string) {
  console.log(`· ${what}`);
}
