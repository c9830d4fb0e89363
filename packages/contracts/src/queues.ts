/** Queue and job names shared by the API (which adds jobs) and the worker (which runs them). */
export const queueNames = {
  email: 'email-delivery',
} as const;

export const jobNames = {
  deliverEmail: 'deliver-email',
  sweepOutbox: 'sweep-email-outbox',
} as const;

export interface DeliverEmailJob {
  outboxId: number;
}

/** A deterministic job id, so that adding the same delivery twice queues it once. */
export function deliverEmailJobId(outboxId: number): string {
  return `email-${outboxId}`;
}
