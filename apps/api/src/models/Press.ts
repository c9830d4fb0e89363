import { Model } from 'objection';
import type { PressKind } from '@kerfmark/contracts';

export class Press extends Model {
  static override tableName = 'presses';

  id!: number;
  organisationId!: number;
  name!: string;
  kind!: PressKind;
  maxSheetWidthIn!: number;
  maxSheetLengthIn!: number;
  typicalSpeedSph!: number;
  maxSpeedSph!: number;
  active!: boolean;
  createdAt!: Date;
}
