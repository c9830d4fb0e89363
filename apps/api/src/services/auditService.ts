import type { Knex } from 'knex';
import { AuditEntry } from '../models';

export interface AuditRecord {
  organisationId: number | null;
  actorUserId: number | null;
  entity: string;
  entityId: number;
  action: string;
  detail?: Record<string, unknown>;
}

/** Writes one audit entry in the caller's transaction: who did what to which record, and when. */
export async function recordAudit(trx: Knex.Transaction | Knex, record: AuditRecord): Promise<void> {
  await AuditEntry.query(trx).insert({ ...record, detail: record.detail ?? {} });
}
