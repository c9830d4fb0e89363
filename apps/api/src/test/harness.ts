import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import { pino } from 'pino';
import request from 'supertest';
import { afterAll } from 'vitest';
import type { OrgKind, Role, ShopCapabilities } from '@kerfmark/contracts';
import { createApp } from '../app';
import { hashPassword } from '../auth/passwords';
import { loadConfig, type Config } from '../config';
import { bindModels, createKnex } from '../db/knex';
import { createStorage } from '@kerfmark/storage';
import { createJobQueues } from '../lib/jobQueues';
import { createRedis } from '../lib/redis';
import { Organisation, Press, User } from '../models';
import { insertOpenRequest } from './insertOpenRequest';
import type { AuthUser } from '../auth/passport';
import type { ServiceDeps } from '../services/deps';

// Integration tests run against the real PostgreSQL, Redis and mail catcher that `npm test` starts.
if (!process.env.DATABASE_URL) {
  throw new Error('DATABASE_URL is not set: run the API tests through `npm test`, which starts the services.');
}
const config: Config = { ...loadConfig(), bcryptRounds: 4 };
export const knex = createKnex(config.databaseUrl);
bindModels(knex);
const logger = pino({ level: 'silent' });
const redis = createRedis(config.redisUrl);
redis.on('error', () => undefined);
const queues = createJobQueues(config.redisUrl, logger);
export const storage = createStorage(config.storage);

export const app: Express = createApp({
  config,
  knex,
  redis,
  logger,
  emails: queues.emails,
  analyses: queues.analyses,
  reminders: queues.reminders,
  storage,
});
export const testConfig = config;
export const PASSWORD = 'correct horse battery';

afterAll(async () => {
  await Promise.allSettled([queues.close(), redis.quit()]);
  await knex.destroy();
});

/** A unique suffix so that tests running side by side never share a record. */
export const unique = () => randomUUID().slice(0, 8);

export async function createOrg(kind: OrgKind, name = `${kind === 'printer' ? 'Printer' : 'Die shop'} ${unique()}`) {
  return Organisation.query().insertAndFetch({
    name,
    kind,
    timeZone: 'America/Chicago',
    postcode: '60614',
    country: 'US',
  });
}

export async function createUser(org: Organisation, role: Role, opts: { status?: 'active' | 'disabled' } = {}) {
  const email = `${role}-${unique()}@test.example`;
  const user = await User.query().insertAndFetch({
    organisationId: org.id,
    email,
    name: `Test ${role} ${unique()}`,
    role,
    status: opts.status ?? 'active',
    passwordHash: await hashPassword(PASSWORD, 4),
  });
  return user;
}

export async function createPress(org: Organisation, name = `Press ${unique()}`) {
  return Press.query().insertAndFetch({
    organisationId: org.id,
    name,
    kind: 'platen',
    maxSheetWidthIn: 22,
    maxSheetLengthIn: 30,
    typicalSpeedSph: 4000,
    maxSpeedSph: 5000,
    active: true,
  });
}

export async function signIn(user: User): Promise<string> {
  const res = await request(app).post('/api/auth/login').send({ email: user.email, password: PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.token as string;
}

/** A printer and a die shop with one user of every role each, signed in. */
export async function createWorld() {
  const printer = await createOrg('printer');
  const shop = await createOrg('die_shop');
  const users = {
    buyer: await createUser(printer, 'buyer'),
    purchasing: await createUser(printer, 'purchasing'),
    printerAdmin: await createUser(printer, 'admin'),
    estimator: await createUser(shop, 'estimator'),
    shopAdmin: await createUser(shop, 'admin'),
  };
  const tokens = Object.fromEntries(
    await Promise.all(Object.entries(users).map(async ([key, user]) => [key, await signIn(user)])),
  ) as Record<keyof typeof users, string>;
  return { printer, shop, users, tokens };
}
export type World = Awaited<ReturnType<typeof createWorld>>;

/** Waits for an e-mail to arrive at the mail catcher and returns it. */
export async function waitForEmail(
  to: string,
  subject: string | RegExp = '',
  // Generous: the e-mail waits for the worker, which shares two cores with the whole suite.
  timeoutMs = 30_000,
): Promise<{ subject: string; text: string; html: string | null }> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${process.env.MAIL_CATCHER_URL}/api/messages?to=${encodeURIComponent(to)}`);
    const messages = (await res.json()) as Array<{ subject: string; text: string; html: string | null }>;
    const match = messages.find((m) =>
      typeof subject === 'string' ? m.subject.includes(subject) : subject.test(m.subject),
    );
    if (match) return match;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no e-mail to ${to} within ${timeoutMs} ms`);
}

/**
 * An open request with a measured dieline (the 4 × 3 in test rectangle: 14 in of cutting rule and
 * 4 in of creasing rule), made straight in the database so bidding tests need no worker.
 */
export async function createOpenRequest(
  world: { printer: Organisation; users: { buyer: User } },
  opts: { deadline?: Date; needByDate?: string } = {},
) {
  return insertOpenRequest(world.printer.id, world.users.buyer.id, opts);
}

/** Another die shop with an estimator, signed in. */
export async function createShop() {
  const shop = await createOrg('die_shop');
  const estimator = await createUser(shop, 'estimator');
  return { shop, estimator, token: await signIn(estimator) };
}

/** What the services are built with, the same as the app's: for testing a service's functions alone. */
export const deps: ServiceDeps = {
  config,
  knex,
  logger,
  emails: queues.emails,
  analyses: queues.analyses,
  reminders: queues.reminders,
  storage,
};

/** A die shop's capabilities as the sign-in reads them, from its model. */
function shopCapabilitiesOf(org: Organisation): ShopCapabilities {
  const { dieKinds, maxBoardWidthIn, maxBoardLengthIn, ruleHeightsIn, makesCounters, fitsEjectionRubber } = org;
  return { dieKinds, maxBoardWidthIn, maxBoardLengthIn, ruleHeightsIn, makesCounters, fitsEjectionRubber };
}

/** The signed-in user a route would hand a service, for a user made here. */
export function actorOf(user: User, org: Organisation): AuthUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    organisationId: org.id,
    orgKind: org.kind,
    timeZone: org.timeZone,
    orgPostcode: org.postcode,
    shopCapabilities: org.kind === 'die_shop' ? shopCapabilitiesOf(org) : null,
    jti: randomUUID(),
    tokenExpiresAt: new Date(Date.now() + 3_600_000),
  };
}
