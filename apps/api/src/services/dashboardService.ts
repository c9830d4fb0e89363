import type { DashboardDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { atRiskRequests } from './dashboard/atRiskRequests';
import { shopRecord } from './dashboard/shopRecord';
import { upcomingDates } from './dashboard/upcomingDates';
import type { ServiceDeps } from './deps';
import type { createPriceHistoryService } from './priceHistoryService';

type PriceHistory = Pick<ReturnType<typeof createPriceHistoryService>, 'fairPriceFor'>;

/**
 * A user's home page: the printer's requests at risk, everyone's dates in the next 30 days, and
 * for a die shop its own record.
 */
export async function dashboardFor(
  { knex }: Pick<ServiceDeps, 'knex'>,
  priceHistory: PriceHistory,
  actor: AuthUser,
): Promise<DashboardDto> {
  return {
    atRisk: actor.orgKind === 'printer' ? await atRiskRequests(actor) : [],
    upcoming: await upcomingDates(actor),
    shopRecord: actor.orgKind === 'die_shop' ? await shopRecord(knex, actor, priceHistory.fairPriceFor) : null,
  };
}

export function createDashboardService(deps: ServiceDeps, priceHistory: PriceHistory) {
  return { dashboard: (actor: AuthUser) => dashboardFor(deps, priceHistory, actor) };
}
