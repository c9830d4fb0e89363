import type { Invitation as InvitationDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { newToken } from '../../lib/hashToken';
import { conflict, notFound } from '../../lib/httpError';
import { Invitation } from '../../models';
import { recordAudit } from '../auditService';
import { invitationExpiry, sendInvitation, toInvitationDto, type InvitationDeps } from './invitationMail';

/** The organisation's own invitation, locked; another organisation's is a 404. */
async function ownInvitation(trx: Knex.Transaction, actor: AuthUser, id: number): Promise<Invitation> {
  const invitation = await Invitation.query(trx).findOne({ id, organisationId: actor.organisationId }).forUpdate();
  if (!invitation) throw notFound('That invitation');
  return invitation;
}

async function audit(trx: Knex.Transaction, actor: AuthUser, id: number, action: 'resent' | 'revoked') {
  await recordAudit(trx, {
    organisationId: actor.organisationId,
    actorUserId: actor.id,
    entity: 'invitation',
    entityId: id,
    action,
  });
}

/** A new link (the old one stops working) and a fresh expiry. */
export async function resendInvitation(deps: InvitationDeps, actor: AuthUser, id: number): Promise<InvitationDto> {
  return deps.knex.transaction(async (trx) => {
    const invitation = await ownInvitation(trx, actor, id);
    if (invitation.acceptedAt || invitation.revokedAt)
      throw conflict('That invitation was already accepted or revoked.');
    const { token, hash } = newToken();
    const updated = await invitation.$query(trx).patchAndFetch({ tokenHash: hash, expiresAt: invitationExpiry(deps) });
    await sendInvitation(trx, deps, actor, updated, token);
    await audit(trx, actor, id, 'resent');
    return toInvitationDto(updated);
  });
}

/** The link stops working; revoking twice changes nothing, and an accepted invitation stays accepted. */
export async function revokeInvitation(knex: Knex, actor: AuthUser, id: number): Promise<InvitationDto> {
  return knex.transaction(async (trx) => {
    const invitation = await ownInvitation(trx, actor, id);
    if (invitation.acceptedAt) throw conflict('That invitation was already accepted.');
    const updated = invitation.revokedAt
      ? invitation
      : await invitation.$query(trx).patchAndFetch({ revokedAt: new Date() });
    await audit(trx, actor, id, 'revoked');
    return toInvitationDto(updated);
  });
}
