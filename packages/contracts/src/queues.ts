/** Queue and job names shared by the API (which adds jobs) and the worker (which runs them). */
export const queueNames = {
  email: 'email-delivery',
  dieline: 'dieline-analysis',
  reminders: 'deadline-reminders',
} as const;

export const jobNames = {
  deliverEmail: 'deliver-email',
  sweepOutbox: 'sweep-email-outbox',
  analyseDieline: 'analyse-dieline',
  sweepAnalyses: 'sweep-waiting-analyses',
  planReminders: 'plan-request-reminders',
  sendReminder: 'send-reminder',
  sweepReminders: 'sweep-reminders',
} as const;

export interface DeliverEmailJob {
  outboxId: number;
}

export interface AnalyseDielineJob {
  fileId: number;
}

/** A deterministic job id, so that adding the same delivery twice queues it once. */
export function deliverEmailJobId(outboxId: number): string {
  return `email-${outboxId}`;
}

/** One id per analysis run of a file: a remap starts a new run, a double click does not. */
export function analyseDielineJobId(fileId: number, run: number): string {
  return `analyse-${fileId}-run-${run}`;
}

export interface PlanRemindersJob {
  requestId: number;
}

export interface SendReminderJob {
  requestId: number;
  key: string;
}

/** A reminder's job id is its key: the same reminder planned twice is one job. */
export function reminderJobId(key: string): string {
  return `reminder-${key}`;
}
