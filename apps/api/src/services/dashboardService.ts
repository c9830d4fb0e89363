import { formatCalendarDate as day, type AtRiskItem, type DashboardDto, type UpcomingItem } from '@kerfmark/contracts';
import { addWorkingDays, checkArrival, runHours } from '@kerfmark/pricing';
import type { AuthUser } from '../auth/passport';
import { todayIn } from '../lib/todayIn';
import { Award, Bid, DieRequest } from '../models';
import type { ServiceDeps } from './deps';
import { factsOf, visibleParts, visibleTo } from '../access';

const LIVE = ['open', 'bidding_closed', 'awarded', 'in_production'];
const HORIZON_DAYS = 30;

/** The owner's own request, so the only ties the rule reads are none. */
const mayReckonWithBids = (actor: AuthUser, r: DieRequest, now: Date) =>
  visibleParts(actor, factsOf(r, { invitedShopIds: [], bidderShopIds: [], awardedShopId: null }), now)
    .bidFiguresOnDashboard;

export function createDashboardService(_deps: ServiceDeps) {
  /**
   * Requests whose need-by date is at risk, given the award's ship date, else (once bids are
   * opened) the lowest bid's, else the request's own planned lead time, and the die-cutting run.
   * Before the deadline the bids are sealed: only the request's own dates count.
   */
  async function atRisk(actor: AuthUser): Promise<AtRiskItem[]> {
    const today = todayIn(actor.timeZone);
    const now = new Date();
    const requests = await DieRequest.query()
      .where({ organisationId: actor.organisationId })
      .whereIn('status', LIVE)
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

  /** Bid deadlines, need-by dates and promised ship dates in the next 30 days. */
  async function upcoming(actor: AuthUser): Promise<UpcomingItem[]> {
    const now = new Date();
    const until = new Date(now.getTime() + HORIZON_DAYS * 86_400_000);
    const untilDay = until.toISOString().slice(0, 10);
    const today = todayIn(actor.timeZone);
    const items: UpcomingItem[] = [];
    if (actor.orgKind === 'printer') {
      const requests = await DieRequest.query().where({ organisationId: actor.organisationId }).whereIn('status', LIVE);
      const awards = await Award.query().whereIn(
        'requestId',
        requests.map((r) => r.id),
      );
      for (const r of requests) {
        if (r.status === 'open' && r.bidDeadline && r.bidDeadline > now && r.bidDeadline < until)
          items.push({ requestId: r.id, title: r.title, kind: 'bid_deadline', at: r.bidDeadline.toISOString() });
        if (r.needByDate && r.needByDate >= today && r.needByDate <= untilDay)
          items.push({ requestId: r.id, title: r.title, kind: 'need_by', at: r.needByDate });
        const award = awards.find((a) => a.requestId === r.id);
        if (award && !r.shippedAt && award.promisedShipDate <= untilDay)
          items.push({ requestId: r.id, title: r.title, kind: 'promised_ship', at: award.promisedShipDate });
      }
    } else {
      const open = await visibleTo(DieRequest.query(), actor)
        .where('die_requests.status', 'open')
        .where('die_requests.bidDeadline', '>', now)
        .where('die_requests.bidDeadline', '<', until);
      for (const r of open)
        items.push({ requestId: r.id, title: r.title, kind: 'bid_deadline', at: r.bidDeadline!.toISOString() });
      const won = await DieRequest.query()
        .castTo<Array<Pick<DieRequest, 'id' | 'title'> & { promisedShipDate: string }>>()
        .join('awards', 'awards.requestId', 'die_requests.id')
        .where('awards.shopId', actor.organisationId)
        .whereNull('die_requests.shippedAt')
        .whereIn('die_requests.status', ['awarded', 'in_production'])
        .select('die_requests.id', 'die_requests.title', 'awards.promisedShipDate');
      for (const r of won)
        items.push({ requestId: r.id, title: r.title, kind: 'promised_ship', at: r.promisedShipDate });
    }
    return items.sort((a, b) => a.at.localeCompare(b.at));
  }

  return {
    async dashboard(actor: AuthUser): Promise<DashboardDto> {
      return { atRisk: actor.orgKind === 'printer' ? await atRisk(actor) : [], upcoming: await upcoming(actor) };
    },
  };
}
