import { formatCalendarDate, pressHoursPerDay, type AtRiskItem } from '@kerfmark/contracts';
import { addWorkingDays, checkArrival, runHours } from '@kerfmark/pricing';
import { factsOf, visibleParts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { readingStyle } from '../../lib/readingStyle';
import { todayIn } from '../../lib/todayIn';
import { Award, Bid, DieRequest } from '../../models';
import { LIVE_STATUSES } from './liveStatuses';

/** The owner's own request, so the only ties the rule reads are none. */
const mayReckonWithBids = (actor: AuthUser, r: DieRequest, now: Date) =>
  visibleParts(actor, factsOf(r, { invitedShopIds: [], bidderShopIds: [], awardedShopId: null }), now)
    .bidFiguresOnDashboard;

/**
 * Requests whose need-by date is at risk, given the award's ship date, else (once bids are
 * opened) the lowest bid's, else the request's own planned lead time, and the die-cutting run.
 * Before the deadline the bids are sealed: only the request's own dates count.
 */
export async function atRiskRequests(actor: AuthUser): Promise<AtRiskItem[]> {
  // The reasons are written for the reader: dates in their locale.
  const { locale } = await readingStyle(DieRequest.knex(), actor.id);
  const day = (date: string) => formatCalendarDate(date, locale);
  const today = todayIn(actor.timeZone);
  const now = new Date();
  const requests = await DieRequest.query()
    .where({ organisationId: actor.organisationId })
    .whereIn('status', LIVE_STATUSES)
    .whereNotNull('needByDate')
    .withGraphFetched('press');
  const ids = requests.map((r) => r.id);
  const [awards, bids] = await Promise.all([
    Award.query().whereIn('requestId', ids),
    Bid.query()
      .whereIn(
        'requestId',
        requests.filter((r) => mayReckonWithBids(actor, r, now)).map((r) => r.id),
      )
      .where({ status: 'submitted' })
      .orderBy('totalCents'),
  ]);
  const items: AtRiskItem[] = [];
  for (const request of requests) {
    const award = awards.find((a) => a.requestId === request.id);
    const best = bids.find((b) => b.requestId === request.id);
    const dieExpected =
      award?.promisedShipDate ?? best?.promisedShipDate ?? addWorkingDays(today, request.plannedLeadDays);
    const hours = request.press && request.runSheets ? runHours(request.runSheets, request.press.typicalSpeedSph) : 0;
    const check = checkArrival({
      needByDate: request.needByDate!,
      dieReadyBy: dieExpected < today ? today : dieExpected,
      runHours: hours,
      hoursPerDay: request.press ? pressHoursPerDay(request.press) : undefined,
    });
    const late = Boolean(request.lateFlaggedAt);
    if (check.ok && !late) continue;
    const source = award
      ? 'the awarded shop’s promised ship date'
      : best
        ? 'the lowest bid’s promised ship date'
        : `${request.plannedLeadDays} working days of lead time from today`;
    items.push({
      requestId: request.id,
      title: request.title,
      status: request.status,
      needByDate: request.needByDate!,
      dieExpected,
      latestArrival: check.latestArrival,
      slackDays: check.slackDays,
      late,
      reason: late
        ? `The die was promised to ship by ${day(dieExpected)} and has not shipped.`
        : `With ${source} (${day(dieExpected)}) the die comes after ${day(check.latestArrival)}, the last day that leaves time for the ${check.runDays}-shift run.`,
    });
  }
  return items.sort((a, b) => a.slackDays - b.slackDays);
}
