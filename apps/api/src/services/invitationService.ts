import type {
  Invitation as InvitationDto,
  InvitationAccept,
  InvitationCreate,
  InvitationPreview,
  LoginResult,
} from '@kerfmark/contracts';
import { roleFitsOrg, roleLabels } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../auth/passport';
import { hashPassword } from '../auth/passwords';
import { signToken } from '../auth/tokens';
import { hashToken, newToken } from '../lib/hashToken';
import { badRequest, conflict, HttpError, notFound } from '../lib/httpError';
import { Invitation, Organisation, User } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import { queueEmail } from './emailOutbox';
import { invitationEmail } from './emails/invitationEmail';

function toDto(invitation: Invitation): InvitationDto {
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

const invalidLink = () =>
  new HttpError(410, 'invitation_invalid', 'This invitation link is no longer valid. Ask your admin for a new one.');

export function createInvitationService({ config, knex, emails }: ServiceDeps) {
  async function sendInvitation(trx: Knex.Transaction, actor: AuthUser, invitation: Invitation, token: string) {
    const organisation = await Organisation.query(trx).findById(actor.organisationId).throwIfNotFound();
    const hasAccount = Boolean(await User.query(trx).findOne({ email: invitation.email }));
    const message = invitationEmail({
      hasAccount,
      signInUrl: `${config.appUrl}/sign-in`,
      name: invitation.name,
      role: invitation.role,
      organisationName: organisation.name,
      inviterName: actor.name,
      acceptUrl: `${config.appUrl}/accept-invitation?token=${token}`,
      expiresAt: invitation.expiresAt,
      timeZone: organisation.timeZone,
    });
    await queueEmail(trx, emails, { ...message, to: invitation.email, kind: 'invitation' });
  }

  const expiry = () => new Date(Date.now() + config.invitationTtlHours * 3600_000);

  /** A live invitation for this token, locked for the rest of the transaction. */
  async function liveInvitation(trx: Knex.Transaction | Knex, token: string) {
    const invitation = await Invitation.query(trx)
      .findOne({ tokenHash: hashToken(token) })
      .withGraphJoined('organisation');
    if (!invitation || invitation.status !== 'pending') throw invalidLink();
    return invitation;
  }

  return {
    async list(actor: AuthUser): Promise<InvitationDto[]> {
      const rows = await Invitation.query()
        .where({ organisationId: actor.organisationId })
        .whereNull('acceptedAt')
        .orderBy('createdAt', 'desc');
      return rows.map(toDto);
    },

    async create(actor: AuthUser, input: InvitationCreate): Promise<InvitationDto> {
      if (!roleFitsOrg(input.role, actor.orgKind)) {
        throw badRequest(`${roleLabels[input.role]} is not a role in this organisation.`, {
          role: 'Choose a role this organisation has',
        });
      }
      return knex.transaction(async (trx) => {
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
          expiresAt: expiry(),
        });
        await sendInvitation(trx, actor, invitation, token);
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'invitation',
          entityId: invitation.id,
          action: 'created',
          detail: { email: input.email, role: input.role },
        });
        return toDto(invitation);
      });
    },

    /** A new link (the old one stops working) and a fresh expiry. */
    async resend(actor: AuthUser, id: number): Promise<InvitationDto> {
      return knex.transaction(async (trx) => {
        const invitation = await Invitation.query(trx)
          .findOne({ id, organisationId: actor.organisationId })
          .forUpdate();
        if (!invitation) throw notFound('That invitation');
        if (invitation.acceptedAt || invitation.revokedAt)
          throw conflict('That invitation was already accepted or revoked.');
        const { token, hash } = newToken();
        const updated = await invitation.$query(trx).patchAndFetch({ tokenHash: hash, expiresAt: expiry() });
        await sendInvitation(trx, actor, updated, token);
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'invitation',
          entityId: id,
          action: 'resent',
        });
        return toDto(updated);
      });
    },

    async revoke(actor: AuthUser, id: number): Promise<InvitationDto> {
      return knex.transaction(async (trx) => {
        const invitation = await Invitation.query(trx)
          .findOne({ id, organisationId: actor.organisationId })
          .forUpdate();
        if (!invitation) throw notFound('That invitation');
        if (invitation.acceptedAt) throw conflict('That invitation was already accepted.');
        const updated = invitation.revokedAt
          ? invitation
          : await invitation.$query(trx).patchAndFetch({ revokedAt: new Date() });
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'invitation',
          entityId: id,
          action: 'revoked',
        });
        return toDto(updated);
      });
    },

    async preview(token: string): Promise<InvitationPreview> {
      const invitation = await liveInvitation(knex, token);
      return {
        email: invitation.email,
        name: invitation.name,
        role: invitation.role,
        organisationName: invitation.organisation!.name,
      };
    },

    /** Creates the account, marks the invitation used, and signs the new user in. */
    async accept(input: InvitationAccept): Promise<LoginResult> {
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
    },
  };
}
