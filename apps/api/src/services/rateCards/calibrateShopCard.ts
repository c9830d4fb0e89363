import type { CalibrationDto } from '@kerfmark/contracts';
import { calibrateCard } from '@kerfmark/pricing';
import type { AuthUser } from '../../auth/passport';
import { HttpError } from '../../lib/httpError';
import type { ServiceDeps } from '../deps';
import { rateCardOf } from './rateCardRow';
import { receivedDies } from './receivedDies';

/** The shop's card against its own received dies, in the card's currency (others are not comparable). */
export async function calibrateShopCard({ knex }: Pick<ServiceDeps, 'knex'>, actor: AuthUser): Promise<CalibrationDto> {
  const card = await rateCardOf(knex, actor.organisationId);
  if (!card) throw new HttpError(409, 'no_rate_card', 'Your shop has no rate card yet.');
  const received = await receivedDies(knex, actor.organisationId, card.currency);
  return { currency: card.currency, ...calibrateCard(card, received) };
}
