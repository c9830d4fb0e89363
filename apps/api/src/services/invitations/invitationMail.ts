import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { Invitation, Organisation, User } from '../../models';
import type { ServiceDeps } from '../deps';
import { queueEmail } from '../emailOutbox';
import { invitationEmail } from '../emails/invitationEmail';
import type { Invitation as InvitationDto } from '@kerfmark/contracts';

export type InvitationDeps = Pick<ServiceDeps, 'config' | 'knex' | 'emails'>;

export function toInvitationDto(invitation: Invitation): InvitationDto {
  return {
    id: invitation.id,
    email: invitation.email,
    name: invitation.name,
    role: invitation.role,
    status: invitation.status,
    expiresAt: invitation.expiresAt.toISOString(),
    createdAt: invitation.createdAt.toISOString(),
  };
}

/** When a link sent now stops working. */
export const invitationExpiry = (deps: Pick<ServiceDeps, 'config'>) =>
  new Date(Date.now() + deps.config.invitationTtlHours * 3600_000);

/** Queues the invitation e-mail with its link; one to an address with an account says so. */
export async function sendInvitation(
  trx: Knex.Transaction,
  deps: InvitationDeps,
  actor: AuthUser,
  invitation: Invitation,
  token: string,
) {
  const organisation = await Organisation.query(trx).findById(actor.organisationId).throwIfNotFound();
  const hasAccount = Boolean(await User.query(trx).findOne({ email: invitation.email }));
  const message = invitationEmail({
    hasAccount,
    signInUrl: `${deps.config.appUrl}/sign-in`,
    name: invitation.name,
    role: invitation.role,
    organisationName: organisation.name,
    inviterName: actor.name,
    acceptUrl: `${deps.config.appUrl}/accept-invitation?token=${token}`,
    expiresAt: invitation.expiresAt,
    timeZone: organisation.timeZone,
  });
  await queueEmail(trx, deps.emails, { ...message, to: invitation.email, kind: 'invitation' });
}
