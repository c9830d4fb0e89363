// What the API hands to the worker through the job queue; lib/jobQueues implements them.
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
