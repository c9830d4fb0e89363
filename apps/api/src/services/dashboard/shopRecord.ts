import type { DielineMetrics, ShopRecordDto, ShopRecordJob } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { shipCounts } from './shipCounts';

type BandFor = (
  organisationId: number,
  metrics: DielineMetrics | null | undefined,
  currency: string,
) => Promise<{ enough: true; band: { lowCents: number; highCents: number } } | { enough: false }>;

const rate = (won: number, decided: number) => (decided > 0 ? won / decided : null);
const DAY = 86_400_000;

/**
 * The shop's own record. Jobs it lost say only that they went elsewhere: the query reads the
 * award's shop id to tell won from lost and never returns it, nor the winning price.
 */
export async function shopRecord(knex: Knex, actor: AuthUser, bandFor: BandFor): Promise<ShopRecordDto> {
  const shopId = actor.organisationId;
  const [openRow] = await knex('bids as b')
    .join('dieRequests as r', 'r.id', 'b.requestId')
    .where({ 'b.shopId': shopId, 'b.status': 'submitted', 'r.status': 'open' })
    .count({ open: '*' });
  const decided = await knex('bids as b')
    .join('awards as a', 'a.requestId', 'b.requestId')
    .join('dieRequests as r', 'r.id', 'b.requestId')
    .where({ 'b.shopId': shopId, 'b.status': 'submitted' })
    .orderBy('a.awardedAt', 'desc')
    .select(
      'r.id as requestId',
      'r.title',
      'r.organisationId as buyerId',
      'a.awardedAt',
      knex.raw('a.shop_id = ? as won', [shopId]),
      'b.dieCents',
      'b.currency',
    );
  const [ship] = await knex('awards as a')
    .join('dieRequests as r', 'r.id', 'a.requestId')
    .where('a.shopId', shopId)
    .select(shipCounts(knex));
  const since = (days: number) => decided.filter((d) => Date.now() - new Date(d.awardedAt).getTime() <= days * DAY);
  const winRate = (days: number) => rate(since(days).filter((d) => d.won).length, since(days).length);
  const recent: ShopRecordJob[] = [];
  for (const d of decided.slice(0, 20)) recent.push({ ...(await againstBand(knex, d, bandFor)) });
  return {
    openBids: Number(openRow?.open ?? 0),
    won: decided.filter((d) => d.won).length,
    lost: decided.filter((d) => !d.won).length,
    winRate90: winRate(90),
    winRate365: winRate(365),
    shipped: Number(ship?.shipped ?? 0),
    onTimeRate: rate(Number(ship?.onTime ?? 0), Number(ship?.shipped ?? 0)),
    recent,
  };
}

/** One decided job with the shop's bid placed against the buyer's band for the die. */
async function againstBand(
  knex: Knex,
  d: {
    requestId: number;
    title: string;
    buyerId: number;
    awardedAt: Date;
    won: boolean;
    dieCents: number;
    currency: string;
  },
  bandFor: BandFor,
): Promise<ShopRecordJob> {
  const file = await knex('dielineFiles')
    .where({ requestId: d.requestId, analysisStatus: 'done' })
    .orderBy([
      { column: 'isPrimary', order: 'desc' },
      { column: 'uploadedAt', order: 'desc' },
    ])
    .first('metrics');
  const fair = await bandFor(d.buyerId, file?.metrics ?? null, d.currency);
  const mine = Number(d.dieCents);
  let band: ShopRecordJob['band'] = null;
  let offBand: number | null = null;
  if (fair.enough) {
    const { lowCents, highCents } = fair.band;
    band = mine < lowCents ? 'below' : mine > highCents ? 'above' : 'within';
    offBand = band === 'below' ? (lowCents - mine) / lowCents : band === 'above' ? (mine - highCents) / highCents : 0;
  }
  return {
    requestId: d.requestId,
    title: d.title,
    awardedAt: new Date(d.awardedAt).toISOString(),
    outcome: d.won ? 'won' : 'elsewhere',
    myDieCents: mine,
    currency: d.currency,
    band,
    offBand,
  };
}
