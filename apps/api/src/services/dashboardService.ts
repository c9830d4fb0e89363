import type { DashboardDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { atRiskRequests } from './dashboard/atRiskRequests';
import { upcomingDates } from './dashboard/upcomingDates';

/** A user's home page: the printer's requests at risk, and everyone's dates in the next 30 days. */
export async function dashboardFor(actor: AuthUser): Promise<DashboardDto> {
  return {
    atRisk: actor.orgKind === 'printer' ? await atRiskRequests(actor) : [],
    upcoming: await upcomingDates(actor),
  };
}

export function createDashboardService() {
  return { dashboard: dashboardFor };
}
