import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { Storage } from '@kerfmark/storage';
import type { Config } from '../config';
import type { AnalysisDispatcher, EmailDispatcher, ReminderPlanner } from '../lib/dispatchers';

export type { AnalysisDispatcher, EmailDispatcher, ReminderPlanner };

export interface ServiceDeps {
  config: Config;
  knex: Knex;
  logger: Logger;
  emails: EmailDispatcher;
  analyses: AnalysisDispatcher;
  reminders: ReminderPlanner;
  storage: Storage;
}
