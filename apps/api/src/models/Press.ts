import { Model } from 'objection';
import type { Press as PressDto, PressKind } from '@kerfmark/contracts';

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
  shiftsPerDay!: number;
  shiftHours!: number;
  cuttingRuleHeightIn!: PressDto['cuttingRuleHeightIn'];
  active!: boolean;
  createdAt!: Date;
}
