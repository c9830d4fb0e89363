export * from './roles';
export * from './auth';
export * from './users';
export * from './presses';
export * from './errors';
export * from './queues';
export * from './dates';
