import type { RateCardDto, RateCardInput } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import { calibrateShopCard } from './rateCards/calibrateShopCard';
import { estimateForRequest } from './rateCards/estimateForRequest';
import { rateCardOf } from './rateCards/rateCardRow';

/** The shop's card, or null before one is saved. */
export async function getRateCard({ knex }: Pick<ServiceDeps, 'knex'>, actor: AuthUser): Promise<RateCardDto | null> {
  return (await rateCardOf(knex, actor.organisationId))?.dto ?? null;
}

/** Saves the whole card (the admin edits it as one form). */
export async function saveRateCard(
  { knex }: Pick<ServiceDeps, 'knex'>,
  actor: AuthUser,
  input: RateCardInput,
): Promise<RateCardDto> {
  const { currency, ...rates } = input;
  await knex.transaction(async (trx) => {
    await trx('rateCards')
      .insert({
        organisationId: actor.organisationId,
        currency,
        rates: JSON.stringify(rates),
        updatedBy: actor.id,
        updatedAt: new Date(),
      })
      .onConflict('organisationId')
      .merge();
    await recordAudit(trx, {
      organisationId: actor.organisationId,
      actorUserId: actor.id,
      entity: 'rate_card',
      entityId: actor.organisationId,
      action: 'saved',
      detail: { currency },
    });
  });
  return (await rateCardOf(knex, actor.organisationId))!.dto;
}

/** A die shop's rate card: read by its people, saved by its admin, used to estimate and checked against its dies. */
export function createRateCardService(deps: ServiceDeps) {
  return {
    get: (actor: AuthUser) => getRateCard(deps, actor),
    save: (actor: AuthUser, input: RateCardInput) => saveRateCard(deps, actor, input),
    estimate: (actor: AuthUser, requestId: number, opts: { leadDays: number; boardThicknessIn?: number }) =>
      estimateForRequest(deps, actor, requestId, opts),
    calibration: (actor: AuthUser) => calibrateShopCard(deps, actor),
  };
}
