import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { Storage } from '@kerfmark/storage';
import type { Config } from '../config';

/** Adds delivery jobs for outbox rows; a Redis that is down only delays them (the worker sweeps). */
export interface EmailDispatcher {
  deliver(outboxIds: number[]): void;
}

/** Adds an analysis run for an uploaded dieline; the worker's sweep covers a Redis that is down. */
export interface AnalysisDispatcher {
  analyse(fileId: number, run: number): void;
}

/** Asks the worker to plan a request's reminders again after it changed. */
export interface ReminderPlanner {
  plan(requestId: number): void;
}

export interface ServiceDeps {
  config: Config;
  knex: Knex;
  logger: Logger;
  emails: EmailDispatcher;
  analyses: AnalysisDispatcher;
  reminders: ReminderPlanner;
  storage: Storage;
}
