import type { Press as PressDto, PressCreate, PressUpdate } from '@kerfmark/contracts';
import { toPressDto } from '../dto/requestViews';
import { PressCreate as PressCreateSchema } from '@kerfmark/contracts';
import { UniqueViolationError } from 'objection';
import type { AuthUser } from '../auth/passport';
import { parse } from '../lib/parse';
import { HttpError, notFound } from '../lib/httpError';
import { Press } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';

const duplicateName = () =>
  new HttpError(409, 'conflict', 'This organisation already has a press with that name.', {
    name: 'Choose another name',
  });

const isUniqueViolation = (error: unknown) => error instanceof UniqueViolationError;

export function createPressService({ knex }: ServiceDeps) {
  return {
    async list(actor: AuthUser): Promise<PressDto[]> {
      const presses = await Press.query()
        .where({ organisationId: actor.organisationId })
        .orderBy([{ column: 'active', order: 'desc' }, { column: 'name' }]);
      return presses.map(toPressDto);
    },

    async create(actor: AuthUser, input: PressCreate): Promise<PressDto> {
      try {
        return await knex.transaction(async (trx) => {
          const press = await Press.query(trx).insertAndFetch({ ...input, organisationId: actor.organisationId });
          await recordAudit(trx, {
            organisationId: actor.organisationId,
            actorUserId: actor.id,
            entity: 'press',
            entityId: press.id,
            action: 'created',
            detail: { ...input },
          });
          return toPressDto(press);
        });
      } catch (error) {
        throw isUniqueViolation(error) ? duplicateName() : error;
      }
    },

    async update(actor: AuthUser, id: number, patch: PressUpdate): Promise<PressDto> {
      try {
        return await knex.transaction(async (trx) => {
          const press = await Press.query(trx).findOne({ id, organisationId: actor.organisationId }).forUpdate();
          if (!press) throw notFound('That press');
          // The speeds must still make sense together after a partial change.
          parse(PressCreateSchema, { ...toPressDto(press), ...patch });
          const updated = await press.$query(trx).patchAndFetch(patch);
          await recordAudit(trx, {
            organisationId: actor.organisationId,
            actorUserId: actor.id,
            entity: 'press',
            entityId: id,
            action: 'updated',
            detail: { ...patch },
          });
          return toPressDto(updated);
        });
      } catch (error) {
        throw isUniqueViolation(error) ? duplicateName() : error;
      }
    },
  };
}
