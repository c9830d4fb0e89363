import { Model } from 'objection';
import type { BidLine } from '@kerfmark/contracts';

export class BidRevision extends Model {
  static override tableName = 'bid_revisions';

  id!: number;
  bidId!: number;
  revision!: number;
  action!: 'submitted' | 'revised' | 'withdrawn';
  lines!: BidLine[];
  currency!: string;
  totalCents!: number;
  leadDays!: number;
  promisedShipDate!: string;
  validUntil!: string;
  notes!: string | null;
  createdBy!: number | null;
  createdAt!: Date;

  static override get jsonAttributes() {
    return ['lines'];
  }
}
