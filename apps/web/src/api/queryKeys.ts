import type { MaybeRef } from 'vue';

/**
 * Every cached query's key, in one place, so that what a view reads and what a change invalidates
 * always match. A key's first element names the resource; invalidating `queryKeys.requests()`
 * (no arguments) refreshes every list of requests.
 */
export const queryKeys = {
  rateCard: () => ['rate-card'],
  calibration: () => ['rate-card', 'calibration'],
  request: (id?: MaybeRef<number | null>) => (id === undefined ? ['request'] : ['request', id]),
  requests: (query?: MaybeRef<unknown>) => (query === undefined ? ['requests'] : ['requests', query]),
  openRequests: (query: MaybeRef<unknown>) => ['open-requests', query],
  bids: (requestId?: MaybeRef<number>, status?: MaybeRef<string>) =>
    requestId === undefined ? ['bids'] : ['bids', requestId, status],
  estimateAid: () => ['estimate-aid'],
  fairPrice: (requestId: MaybeRef<number>, ruleIn: MaybeRef<number | undefined>) => ['fair-price', requestId, ruleIn],
  libraryMatches: (requestId: MaybeRef<number>, ruleIn: MaybeRef<number | undefined>) => [
    'library-matches',
    requestId,
    ruleIn,
  ],
  preview: (fileId: MaybeRef<number | undefined>, status: MaybeRef<string | undefined>) => ['preview', fileId, status],
  priceHistory: () => ['price-history'],
  priceFit: (query: MaybeRef<unknown>) => ['price-history', 'fit', query],
  priceRecords: (query: MaybeRef<unknown>, page: MaybeRef<number>) => ['price-history', 'list', query, page],
  library: (dieId?: MaybeRef<number | null>) => (dieId === undefined ? ['library'] : ['library', dieId]),
  invitationPreview: (token: MaybeRef<string>) => ['invitation-preview', token],
  presses: () => ['presses'],
  organisationProfile: () => ['organisation-profile'],
  holidays: (year?: MaybeRef<number>) => (year === undefined ? ['holidays'] : ['holidays', year]),
  holidayPlaces: (country: MaybeRef<string | undefined>) => ['holiday-places', country],
  dieShops: (query?: MaybeRef<unknown>) => (query === undefined ? ['die-shops'] : ['die-shops', query]),
  users: () => ['users'],
  invitations: () => ['invitations'],
  notifications: () => ['notifications'],
  preferences: () => ['preferences'],
  dashboard: () => ['dashboard'],
} as const;
