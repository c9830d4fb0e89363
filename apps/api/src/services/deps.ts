import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { Config } from '../config';

/** Adds delivery jobs for outbox rows; a Redis that is down only delays them (the worker sweeps). */
export interface EmailDispatcher {
  deliver(outboxIds: number[]): void;
}

export interface ServiceDeps {
  config: Config;
  knex: Knex;
  logger: Logger;
  emails: EmailDispatcher;
}
