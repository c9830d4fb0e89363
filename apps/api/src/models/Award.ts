import { Model } from 'objection';
import { Organisation } from './Organisation';

export class Award extends Model {
  static override tableName = 'awards';

  id!: number;
  requestId!: number;
  bidId!: number;
  shopId!: number;
  revision!: number;
  totalCents!: number;
  dieCents!: number;
  currency!: string;
  leadDays!: number;
  promisedShipDate!: string;
  reason!: string | null;
  awardedBy!: number | null;
  awardedAt!: Date;
  poNumber!: string;
  poS3Key!: string | null;
  shop?: Organisation;

  static override get relationMappings() {
    return {
      shop: {
        relation: Model.BelongsToOneRelation,
        modelClass: Organisation,
        join: { from: 'awards.shopId', to: 'organisations.id' },
      },
    };
  }
}
