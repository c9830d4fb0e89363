import type { RequestStatus } from '@kerfmark/contracts';

/** Requests still on their way to a die in the printer's hands. */
export const LIVE_STATUSES: RequestStatus[] = ['open', 'bidding_closed', 'awarded', 'in_production'];
