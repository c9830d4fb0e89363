import { z } from 'zod';

/** Every kind of notice Kerfmark sends; each user chooses which of them also come by e-mail. */
export const notificationKindLabels = {
  bid_deadline_48h: 'Bids due in 48 hours (to shops that have not bid)',
  bid_deadline_24h: 'Bids due in 24 hours (to shops that have not bid)',
  bidding_closed: 'Bidding closed on a request you bid on',
  deadline_changed: 'The bid deadline moved on a request you bid on',
  request_cancelled: 'A request you bid on was cancelled',
  bids_ready: 'Bids ready to compare',
  validity_ending: 'The best bid’s price is about to lapse',
  award_won: 'A job was awarded to your shop',
  award_lost: 'A job you bid on went elsewhere',
  in_production: 'A die went into production',
  shipped: 'A die shipped',
  received: 'A die was received',
  need_by_7d: 'A die is needed in 7 days',
  need_by_2d: 'A die is needed in 2 days',
  late_shipment: 'A die is late',
} as const;
export type NotificationKind = keyof typeof notificationKindLabels;
export const notificationKinds = Object.keys(notificationKindLabels) as NotificationKind[];

export const PreferencesUpdate = z.object({
  // Only the kinds that change; a zod 4 record over an enum would demand every key.
  email: z.partialRecord(z.enum(notificationKinds as [NotificationKind, ...NotificationKind[]]), z.boolean()),
});

export interface PreferencesDto {
  email: Record<NotificationKind, boolean>;
}

export interface UpcomingItem {
  requestId: number;
  title: string;
  kind: 'bid_deadline' | 'need_by' | 'promised_ship';
  /** An instant (bid deadline) or a date (need-by, promised ship). */
  at: string;
}

export interface AtRiskItem {
  requestId: number;
  title: string;
  status: string;
  needByDate: string;
  dieExpected: string;
  latestArrival: string;
  slackDays: number;
  late: boolean;
  reason: string;
}

export interface DashboardDto {
  atRisk: AtRiskItem[];
  upcoming: UpcomingItem[];
}
