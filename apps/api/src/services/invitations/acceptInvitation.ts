import type { InvitationAccept, InvitationPreview, LoginResult } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { hashPassword } from '../../auth/passwords';
import { signToken } from '../../auth/tokens';
import { hashToken } from '../../lib/hashToken';
import { HttpError } from '../../lib/httpError';
import { Invitation, User } from '../../models';
import { recordAudit } from '../auditService';
import type { ServiceDeps } from '../deps';

const invalidLink = () =>
  new HttpError(410, 'invitation_invalid', 'This invitation link is no longer valid. Ask your admin for a new one.');

/** A live invitation for this token. */
async function liveInvitation(trx: Knex.Transaction | Knex, token: string) {
  const invitation = await Invitation.query(trx)
    .findOne({ tokenHash: hashToken(token) })
    .withGraphJoined('organisation');
  if (!invitation || invitation.status !== 'pending') throw invalidLink();
  return invitation;
}

/** What the link's holder is invited to, before they choose a password. */
export async function previewInvitation(knex: Knex, token: string): Promise<InvitationPreview> {
  const invitation = await liveInvitation(knex, token);
  return {
    email: invitation.email,
    name: invitation.name,
    role: invitation.role,
    organisationName: invitation.organisation!.name,
  };
}

/** Creates the account, marks the invitation used, and signs the new user in. */
export async function acceptInvitation(
  { config, knex }: Pick<ServiceDeps, 'config' | 'knex'>,
  input: InvitationAccept,
): Promise<LoginResult> {
  const passwordHash = await hashPassword(input.password, config.bcryptRounds);
  const userId = await knex.transaction(async (trx) => {
    const found = await liveInvitation(trx, input.token);
    // Lock the row: two clicks on the same link create one account.
    const invitation = await Invitation.query(trx).findById(found.id).forUpdate();
    if (!invitation || invitation.status !== 'pending') throw invalidLink();
    // Told to the holder of the link (the address's owner), never to the inviting organisation.
    if (await User.query(trx).findOne({ email: invitation.email })) {
      throw new HttpError(
        409,
        'account_exists',
        'This e-mail address already has a Kerfmark account. Sign in with it, or ask for an invitation to another address.',
      );
    }
    const user = await User.query(trx).insertAndFetch({
      organisationId: invitation.organisationId,
      email: invitation.email,
      name: invitation.name,
      role: invitation.role,
      passwordHash,
      status: 'active',
    });
    await invitation.$query(trx).patch({ acceptedAt: new Date() });
    await recordAudit(trx, {
      organisationId: invitation.organisationId,
      actorUserId: user.id,
      entity: 'invitation',
      entityId: invitation.id,
      action: 'accepted',
    });
    return user.id;
  });
  const { token, expiresAt } = signToken(userId, config.jwtSecret, config.tokenTtlSeconds);
  return { token, expiresAt: expiresAt.toISOString() };
}
