import { Model } from 'objection';
import type { Role } from '@kerfmark/contracts';
import { Organisation } from './Organisation';

export class Invitation extends Model {
  static override tableName = 'invitations';

  id!: number;
  organisationId!: number;
  email!: string;
  name!: string;
  role!: Role;
  tokenHash!: string;
  invitedBy!: number | null;
  expiresAt!: Date;
  acceptedAt!: Date | null;
  revokedAt!: Date | null;
  createdAt!: Date;
  organisation?: Organisation;

  static override get relationMappings() {
    return {
      organisation: {
        relation: Model.BelongsToOneRelation,
        modelClass: Organisation,
        join: { from: 'invitations.organisationId', to: 'organisations.id' },
      },
    };
  }

  get status(): 'pending' | 'accepted' | 'expired' | 'revoked' {
    if (this.acceptedAt) return 'accepted';
    if (this.revokedAt) return 'revoked';
    return this.expiresAt.getTime() < Date.now() ? 'expired' : 'pending';
  }
}
