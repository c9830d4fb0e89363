import type { User as UserDto, UserUpdate } from '@kerfmark/contracts';
import { roleFitsOrg, roleLabels } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { badRequest, conflict, notFound } from '../lib/httpError';
import { User } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';

export function toUserDto(user: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    status: user.status,
    createdAt: user.createdAt.toISOString(),
  };
}

export function createUserService({ knex }: ServiceDeps) {
  return {
    async list(actor: AuthUser): Promise<UserDto[]> {
      const users = await User.query().where({ organisationId: actor.organisationId }).orderBy('name');
      return users.map(toUserDto);
    },

    async update(actor: AuthUser, id: number, patch: UserUpdate): Promise<UserDto> {
      return knex.transaction(async (trx) => {
        // Lock the organisation's active admins first, always in id order, so that two admins
        // demoting each other at once wait for each other instead of leaving none (or deadlocking).
        const admins = await User.query(trx)
          .where({ organisationId: actor.organisationId, role: 'admin', status: 'active' })
          .orderBy('id')
          .forUpdate();
        const user = await User.query(trx).findOne({ id, organisationId: actor.organisationId }).forUpdate();
        if (!user) throw notFound('That user');
        if (patch.role && !roleFitsOrg(patch.role, actor.orgKind)) {
          throw badRequest(`${roleLabels[patch.role]} is not a role in this organisation.`, {
            role: 'Choose a role this organisation has',
          });
        }
        const losesAdmin =
          user.role === 'admin' &&
          user.status === 'active' &&
          ((patch.role && patch.role !== 'admin') || patch.status === 'disabled');
        if (losesAdmin && admins.length <= 1) throw conflict('An organisation needs at least one active admin.');
        const before = { role: user.role, status: user.status };
        const changes = {
          ...(patch.role ? { role: patch.role } : {}),
          ...(patch.status ? { status: patch.status } : {}),
        };
        const updated = await user.$query(trx).patchAndFetch(changes);
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'user',
          entityId: user.id,
          action: 'updated',
          detail: { from: before, to: changes },
        });
        return toUserDto(updated);
      });
    },
  };
}
