import { Model } from 'objection';

export class AuditEntry extends Model {
  static override tableName = 'audit_log';

  id!: number;
  organisationId!: number | null;
  actorUserId!: number | null;
  entity!: string;
  entityId!: number;
  action!: string;
  detail!: Record<string, unknown>;
  at!: Date;

  static override get jsonAttributes() {
    return ['detail'];
  }
}
