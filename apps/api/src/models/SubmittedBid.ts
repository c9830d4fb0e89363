import type { BidLine } from '@kerfmark/contracts';

/** A bid as the comparison reads it with its request (readRequestGraph's part): its shop's name and record beside it. */
export interface SubmittedBid {
  id: number;
  shopId: number;
  shopName: string;
  revision: number;
  lines: BidLine[];
  currency: string;
  totalCents: number;
  dieCents: number;
  leadDays: number;
  promisedShipDate: string;
  validUntil: string;
  /** The shop's record: its awarded jobs, and of those shipped the share shipped by the promised date. */
  pastJobs: number;
  onTimeRate: number | null;
}
