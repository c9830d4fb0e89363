import type { NotificationKind } from './notifications';
import type { BestColumn } from '@kerfmark/pricing';
import { z } from 'zod';
import { calendarDate } from './dateFields';
import { recordId } from './ids';

export const bidLineKinds = ['die', 'counter', 'ejection_rubber', 'shipping', 'other'] as const;
export const BidLineKind = z.enum(bidLineKinds);
export type BidLineKind = z.infer<typeof BidLineKind>;
export const bidLineLabels: Record<BidLineKind, string> = {
  die: 'Die',
  counter: 'Counter / make-ready',
  ejection_rubber: 'Ejection rubber',
  shipping: 'Shipping',
  other: 'Other',
};

// ISO 4217 codes the marketplace prices in.
export const currencies = ['USD', 'CAD', 'MXN', 'EUR', 'GBP', 'JPY'] as const;
export const Currency = z.enum(currencies, { error: 'Choose a currency' });

export const BidLine = z.object({
  kind: BidLineKind,
  description: z.string().trim().max(200, 'At most 200 characters').default(''),
  amountCents: z
    .number({ error: 'Enter an amount' })
    .int('Amounts are whole cents')
    .min(0, 'An amount cannot be negative')
    .max(100_000_000_00, 'That amount is too large'),
});
export type BidLine = z.infer<typeof BidLine>;

export const BidInput = z.object({
  lines: z
    .array(BidLine)
    .min(1, 'Add at least one price line')
    .max(20, 'At most 20 price lines')
    .refine((lines) => lines.some((l) => l.kind === 'die'), { error: 'Include the price of the die itself' }),
  currency: Currency,
  leadDays: z
    .number({ error: 'Enter the lead time' })
    .int('Whole working days')
    .min(1, 'At least 1 working day')
    .max(120, 'At most 120 working days'),
  validUntil: calendarDate('Enter the date the price holds until'),
  notes: z.string().trim().max(4000, 'At most 4,000 characters').nullable().optional(),
});
export type BidInput = z.input<typeof BidInput>;

export const DeclineInput = z.object({
  reason: z.string({ error: 'Say why, for the buyer' }).trim().min(2, 'Say why, for the buyer').max(500),
});
export const AwardInput = z.object({
  bidId: recordId(z.number({ error: 'Choose a bid' }), 'Choose a bid'),
  reason: z.string().trim().max(2000).optional(),
});
export const ShipInput = z.object({
  trackingNote: z
    .string({ error: 'Add the carrier and tracking number' })
    .trim()
    .min(2, 'Add the carrier and tracking number')
    .max(500),
});
export const ReceiveInput = z.object({
  condition: z.enum(['good', 'damaged'], { error: 'Say what condition the die arrived in' }),
  notes: z.string().trim().max(2000).optional(),
});

export interface BidRevisionDto {
  revision: number;
  action: 'submitted' | 'revised' | 'withdrawn';
  totalCents: number;
  currency: string;
  leadDays: number;
  promisedShipDate: string;
  validUntil: string;
  createdAt: string;
}

export interface BidDto {
  id: number;
  requestId: number;
  status: 'submitted' | 'withdrawn';
  revision: number;
  lines: BidLine[];
  currency: string;
  totalCents: number;
  leadDays: number;
  promisedShipDate: string;
  validUntil: string;
  notes: string | null;
  submittedAt: string;
  updatedAt: string;
  revisions: BidRevisionDto[];
}

export interface ComparedBidDto {
  bidId: number;
  shopId: number;
  shopName: string;
  lines: BidLine[];
  currency: string;
  totalCents: number;
  dieCents: number;
  overLowestCents: number;
  centsPerInch: number | null;
  leadDays: number;
  promisedShipDate: string;
  daysLate: number;
  validUntil: string;
  expired: boolean;
  onTimeRate: number | null;
  pastJobs: number;
  revision: number;
  /** Whether awarding this bid needs a written reason (the pricing package's awardReason). */
  needsReason: boolean;
  best: BestColumn[];
}

export interface BidComparisonDto {
  requestId: number;
  needByDate: string | null;
  priceRuleIn: number | null;
  bids: ComparedBidDto[];
  fairPrice: { lowCents: number; typicalCents: number; highCents: number; currency: string } | null;
  award: AwardDto | null;
}

export interface AwardDto {
  id: number;
  bidId: number;
  shopName: string;
  totalCents: number;
  currency: string;
  reason: string | null;
  poNumber: string;
  awardedAt: string;
}

export interface NotificationDto {
  id: number;
  kind: NotificationKind;
  title: string;
  body: string;
  link: string | null;
  readAt: string | null;
  createdAt: string;
}
