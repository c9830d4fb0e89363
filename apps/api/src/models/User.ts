import { Model } from 'objection';
import type { DisplayLocale, LengthUnits, Role, UserStatus } from '@kerfmark/contracts';
import { Organisation } from './Organisation';

export class User extends Model {
  static override tableName = 'users';

  id!: number;
  organisationId!: number;
  email!: string;
  name!: string;
  passwordHash!: string;
  role!: Role;
  status!: UserStatus;
  createdAt!: Date;
  lastSignInAt!: Date | null;
  preferences!: Record<string, boolean>;
  /** Inches or millimetres, or null for the organisation's default (migration 20261204000600). */
  lengthUnits!: LengthUnits | null;
  /** en-US or en-GB, or null for the organisation's default (migration 20261204000700). */
  locale!: DisplayLocale | null;
  organisation?: Organisation;

  static override get jsonAttributes() {
    return ['preferences'];
  }

  static override get relationMappings() {
    return {
      organisation: {
        relation: Model.BelongsToOneRelation,
        modelClass: Organisation,
        join: { from: 'users.organisationId', to: 'organisations.id' },
      },
    };
  }
}
