import { dieFit, dieKindOfPress, type DieNeeds, type DieShopChoices, type DieShopsQuery } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { AuthUser } from '../../auth/passport';
import { distanceMiles } from '../../lib/distanceMiles';
import { notFound } from '../../lib/httpError';
import { postcodeCentre } from '../../lib/postcodeCentre';
import { shipCounts } from '../dashboard/shipCounts';

/** What the die needs, from the printer's own press and saved request; another's is not found. */
async function needsOf(knex: Knex, actor: AuthUser, q: z.output<typeof DieShopsQuery>): Promise<DieNeeds> {
  const own = { organisationId: actor.organisationId };
  const press = q.pressId
    ? await knex('presses')
        .where({ ...own, id: q.pressId })
        .first('kind', 'cuttingRuleHeightIn')
    : null;
  if (q.pressId && !press) throw notFound('That press');
  const request = q.requestId
    ? await knex('dieRequests')
        .where({ ...own, id: q.requestId })
        .first('measuredBoardWidthIn', 'measuredBoardHeightIn')
    : null;
  if (q.requestId && !request) throw notFound('That die request');
  const measured = request?.measuredBoardWidthIn != null && request.measuredBoardHeightIn != null;
  return {
    dieKind: press ? dieKindOfPress(press.kind) : null,
    board: measured ? { width: request.measuredBoardWidthIn, height: request.measuredBoardHeightIn } : null,
    cuttingRuleHeightIn: press?.cuttingRuleHeightIn ?? null,
    counterWanted: q.counterWanted,
    ejectionRubberWanted: q.ejectionRubberWanted,
  };
}

/**
 * Every die shop on Kerfmark, for a printer choosing whom to invite: each with its stated
 * capabilities and whether they fit this die, its distance from the delivery postcode, its
 * on-time rate over all its shipped dies, and the dies this printer has awarded it; with the
 * needs they were checked against, so the buyer can see what is not known yet.
 */
export async function shopChoices(
  knex: Knex,
  actor: AuthUser,
  q: z.output<typeof DieShopsQuery>,
): Promise<DieShopChoices> {
  const needs = await needsOf(knex, actor, q);
  const records = knex('awards as a')
    .join('dieRequests as r', 'r.id', 'a.requestId')
    .groupBy('a.shopId')
    .select('a.shopId', ...shipCounts(knex))
    .select(knex.raw('(count(*) filter (where r.organisation_id = ?))::int as jobs_with_us', [actor.organisationId]))
    .as('k');
  const shops = await knex('organisations as o')
    .leftJoin(records, 'k.shopId', 'o.id')
    .where('o.kind', 'die_shop')
    .orderBy('o.name')
    .select(
      'o.id',
      'o.name',
      'o.postcode',
      'o.dieKinds',
      'o.maxBoardWidthIn',
      'o.maxBoardLengthIn',
      'o.ruleHeightsIn',
      'o.makesCounters',
      'o.fitsEjectionRubber',
      'o.laserCutBoards',
      'k.shipped',
      'k.onTime',
      'k.jobsWithUs',
    );
  const to = postcodeCentre(q.deliveryPostcode);
  const choices = shops.map((s) => {
    const capabilities = {
      dieKinds: s.dieKinds,
      maxBoardWidthIn: s.maxBoardWidthIn,
      maxBoardLengthIn: s.maxBoardLengthIn,
      ruleHeightsIn: s.ruleHeightsIn,
      makesCounters: s.makesCounters,
      fitsEjectionRubber: s.fitsEjectionRubber,
      laserCutBoards: s.laserCutBoards,
    };
    const from = postcodeCentre(s.postcode);
    const shipped = s.shipped ?? 0;
    return {
      id: s.id,
      name: s.name,
      postcode: s.postcode,
      miles: from && to ? Math.round(distanceMiles(from, to)) : null,
      capabilities,
      onTimeRate: shipped > 0 ? (s.onTime ?? 0) / shipped : null,
      shipped,
      jobsWithUs: s.jobsWithUs ?? 0,
      fit: dieFit(needs, capabilities),
    };
  });
  return { needs, shops: choices };
}
