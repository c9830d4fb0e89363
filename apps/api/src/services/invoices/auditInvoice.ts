import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { recordAudit } from '../auditService';

/** An invoice's change of status in the audit log, inside the transaction that makes it. */
export function auditInvoice(
  trx: Knex.Transaction,
  actor: AuthUser,
  invoiceId: number,
  action: string,
  detail: Record<string, unknown> = {},
): Promise<void> {
  return recordAudit(trx, {
    organisationId: actor.organisationId,
    actorUserId: actor.id,
    entity: 'invoice',
    entityId: invoiceId,
    action,
    detail,
  });
}
