import { DisplayLocale, LengthUnits } from './auth';
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
  invoice_raised: 'A die shop sent an invoice or credit note',
  invoice_disputed: 'A printer disputed your invoice',
  invoice_approved: 'A printer approved your invoice for payment',
  invoice_paid: 'A printer paid your invoice',
} as const;
export type NotificationKind = keyof typeof notificationKindLabels;
export const notificationKinds = Object.keys(notificationKindLabels) as NotificationKind[];

export const PreferencesUpdate = z.object({
  // Only the kinds that change; a zod 4 record over an enum would demand every key.
  email: z
    .partialRecord(z.enum(notificationKinds as [NotificationKind, ...NotificationKind[]]), z.boolean())
    .optional(),
  /** Inches or millimetres; null goes back to the organisation's default; absent leaves it. */
  lengthUnits: LengthUnits.nullable().optional(),
  /** en-US or en-GB; null goes back to the organisation's default; absent leaves it. */
  locale: DisplayLocale.nullable().optional(),
});

export interface PreferencesDto {
  email: Record<NotificationKind, boolean>;
  /** The user's own choice, or null for the organisation's. */
  lengthUnits: LengthUnits | null;
  organisationLengthUnits: LengthUnits;
  locale: DisplayLocale | null;
  organisationLocale: DisplayLocale;
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

/** A decided job the shop bid on: won, or gone elsewhere (never whose, never at what price). */
export interface ShopRecordJob {
  requestId: number;
  title: string;
  awardedAt: string;
  outcome: 'won' | 'elsewhere';
  /** The shop's own bid for the die. */
  myDieCents: number;
  currency: string;
  /** Where that bid fell against the buyer's fair-price band; null when the buyer's history gives none. */
  band: 'below' | 'within' | 'above' | null;
  /** How far outside the band, as a share of its nearer edge; 0 within it. */
  offBand: number | null;
}

/** A die shop's record: its open bids, wins and losses, win rates, and how its dies ship. */
export interface ShopRecordDto {
  openBids: number;
  won: number;
  lost: number;
  /** Won ÷ decided among jobs awarded in the last 90 and 365 days; null with none decided. */
  winRate90: number | null;
  winRate365: number | null;
  shipped: number;
  /** Shipped by the promised date ÷ shipped; null before the first shipment. */
  onTimeRate: number | null;
  recent: ShopRecordJob[];
}

export interface DashboardDto {
  atRisk: AtRiskItem[];
  upcoming: UpcomingItem[];
  /** For a die shop only. */
  shopRecord: ShopRecordDto | null;
}
