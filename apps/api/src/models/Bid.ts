import { Model } from 'objection';
import type { BidLine } from '@kerfmark/contracts';
import { Organisation } from './Organisation';

export class Bid extends Model {
  static override tableName = 'bids';

  id!: number;
  requestId!: number;
  shopId!: number;
  status!: 'submitted' | 'withdrawn';
  revision!: number;
  lines!: BidLine[];
  currency!: string;
  totalCents!: number;
  dieCents!: number;
  leadDays!: number;
  promisedShipDate!: string;
  validUntil!: string;
  notes!: string | null;
  submittedAt!: Date;
  updatedAt!: Date;
  shop?: Organisation;

  static override get jsonAttributes() {
    return ['lines'];
  }

  static override get relationMappings() {
    return {
      shop: {
        relation: Model.BelongsToOneRelation,
        modelClass: Organisation,
        join: { from: 'bids.shopId', to: 'organisations.id' },
      },
    };
  }
}
