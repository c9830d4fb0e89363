import { Model } from 'objection';
import type { OrgKind } from '@kerfmark/contracts';

export class Organisation extends Model {
  static override tableName = 'organisations';

  id!: number;
  name!: string;
  kind!: OrgKind;
  timeZone!: string;
  postcode!: string | null;
  country!: string;
  createdAt!: Date;
}
