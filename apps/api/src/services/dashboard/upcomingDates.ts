import type { UpcomingItem } from '@kerfmark/contracts';
import { visibleTo } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { todayIn } from '../../lib/todayIn';
import { Award, DieRequest } from '../../models';
import { LIVE_STATUSES } from './liveStatuses';

const HORIZON_DAYS = 30;

/** Bid deadlines, need-by dates and promised ship dates in the next 30 days. */
export async function upcomingDates(actor: AuthUser): Promise<UpcomingItem[]> {
  const now = new Date();
  const until = new Date(now.getTime() + HORIZON_DAYS * 86_400_000);
  const untilDay = until.toISOString().slice(0, 10);
  const today = todayIn(actor.timeZone);
  const items: UpcomingItem[] = [];
  if (actor.orgKind === 'printer') {
    const requests = await DieRequest.query()
      .where({ organisationId: actor.organisationId })
      .whereIn('status', LIVE_STATUSES);
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
    for (const r of won) items.push({ requestId: r.id, title: r.title, kind: 'promised_ship', at: r.promisedShipDate });
  }
  return items.sort((a, b) => a.at.localeCompare(b.at));
}
