// In-app notifications and the e-mails that go with them, shared by the API and the worker.
export { emailLayout, type EmailParts } from './emailLayout';
export { notifyOrganisation, type Notice, type Reader } from './notifyOrganisation';
export { dieSummary, type DieFigures } from './dieSummary';
