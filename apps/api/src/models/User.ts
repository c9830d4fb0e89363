import { Model } from 'objection';
import type { Role, UserStatus } from '@kerfmark/contracts';
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
