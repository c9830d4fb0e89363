import type { CalibrationDto } from '@kerfmark/contracts';
import { calibrateCard, type ReceivedDie } from '@kerfmark/pricing';
import type { AuthUser } from '../../auth/passport';
import { HttpError } from '../../lib/httpError';
import type { ServiceDeps } from '../deps';
import { rateCardOf } from './rateCardRow';

/** The shop's card against its own received dies, in the card's currency (others are not comparable). */
export async function calibrateShopCard({ knex }: Pick<ServiceDeps, 'knex'>, actor: AuthUser): Promise<CalibrationDto> {
  const card = await rateCardOf(knex, actor.organisationId);
  if (!card) throw new HttpError(409, 'no_rate_card', 'Your shop has no rate card yet.');
  const rows = await knex('priceRecords')
    .where({ shopId: actor.organisationId, currency: card.currency, source: 'award' })
    .orderBy('pricedOn')
    .select('dieCents', 'cutIn', 'creaseIn', 'perfIn', 'kissIn', 'bends', 'joints', 'punches', 'boardAreaSqIn');
  // The record keeps the board's area, not its sides: an area-by-1 board prices the same.
  const received: ReceivedDie[] = rows.map((r) => ({
    diePrice: Number(r.dieCents),
    dieline: {
      length: { cut: Number(r.cutIn), crease: Number(r.creaseIn), perf: Number(r.perfIn), kiss: Number(r.kissIn) },
      bends: Number(r.bends),
      joints: Number(r.joints),
      punches: Number(r.punches),
      board: { width: Number(r.boardAreaSqIn), height: 1 },
    },
  }));
  return { currency: card.currency, ...calibrateCard(card, received) };
}
