import type { InvitationCreate, Invitation as InvitationDto } from '@kerfmark/contracts';
import { roleFitsOrg, roleLabels } from '@kerfmark/contracts';
import type { AuthUser } from '../../auth/passport';
import { newToken } from '../../lib/hashToken';
import { badRequest, HttpError } from '../../lib/httpError';
import { Invitation, User } from '../../models';
import { recordAudit } from '../auditService';
import { invitationExpiry, sendInvitation, toInvitationDto, type InvitationDeps } from './invitationMail';

/** The admin invites someone to a role this kind of organisation has; the e-mail carries the link. */
export async function inviteTeamMember(
  deps: InvitationDeps,
  actor: AuthUser,
  input: InvitationCreate,
): Promise<InvitationDto> {
  if (!roleFitsOrg(input.role, actor.orgKind)) {
    throw badRequest(`${roleLabels[input.role]} is not a role in this organisation.`, {
      role: 'Choose a role this organisation has',
    });
  }
  return deps.knex.transaction(async (trx) => {
    // Someone already in this organisation is a conflict its admin can see in the team list.
    // An account elsewhere is answered as any invitation: only the e-mail, to the address's
    // owner, says it has an account, so no organisation learns who works at another.
    if (await User.query(trx).findOne({ email: input.email, organisationId: actor.organisationId })) {
      throw new HttpError(409, 'conflict', 'Someone in your organisation already has that e-mail.', {
        email: 'Already in your team',
      });
    }
    // An earlier invitation to the same address that lapsed is replaced; a live one is a conflict.
    const earlier = await Invitation.query(trx)
      .findOne({ email: input.email })
      .whereNull('acceptedAt')
      .whereNull('revokedAt');
    if (earlier && earlier.status === 'pending') {
      throw new HttpError(409, 'conflict', 'That address already has an open invitation. Resend it instead.', {
        email: 'Already invited',
      });
    }
    if (earlier) await earlier.$query(trx).patch({ revokedAt: new Date() });
    const { token, hash } = newToken();
    const invitation = await Invitation.query(trx).insertAndFetch({
      organisationId: actor.organisationId,
      email: input.email,
      name: input.name,
      role: input.role,
      tokenHash: hash,
      invitedBy: actor.id,
      expiresAt: invitationExpiry(deps),
    });
    await sendInvitation(trx, deps, actor, invitation, token);
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'invitation',
      entityId: invitation.id,
      action: 'created',
      detail: { email: input.email, role: input.role },
    });
    return toInvitationDto(invitation);
  });
}
