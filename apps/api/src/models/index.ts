export { AuditEntry } from './AuditEntry';
export { EmailOutbox } from './EmailOutbox';
export { Invitation } from './Invitation';
export { Organisation } from './Organisation';
export { Press } from './Press';
export { User } from './User';
