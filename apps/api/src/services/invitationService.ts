import type { InvitationAccept, InvitationCreate, Invitation as InvitationDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { Invitation } from '../models';
import type { ServiceDeps } from './deps';
import { acceptInvitation, previewInvitation } from './invitations/acceptInvitation';
import { toInvitationDto } from './invitations/invitationMail';
import { inviteTeamMember } from './invitations/inviteTeamMember';
import { resendInvitation, revokeInvitation } from './invitations/resendOrRevoke';

/** The organisation's invitations not yet accepted, newest first. */
export async function openInvitations(actor: AuthUser): Promise<InvitationDto[]> {
  const rows = await Invitation.query()
    .where({ organisationId: actor.organisationId })
    .whereNull('acceptedAt')
    .orderBy('createdAt', 'desc');
  return rows.map(toInvitationDto);
}

/** Invitations to an organisation's team: sent by its admin, accepted by the link's holder. */
export function createInvitationService(deps: ServiceDeps) {
  return {
    list: openInvitations,
    create: (actor: AuthUser, input: InvitationCreate) => inviteTeamMember(deps, actor, input),
    resend: (actor: AuthUser, id: number) => resendInvitation(deps, actor, id),
    revoke: (actor: AuthUser, id: number) => revokeInvitation(deps.knex, actor, id),
    preview: (token: string) => previewInvitation(deps.knex, token),
    accept: (input: InvitationAccept) => acceptInvitation(deps, input),
  };
}
