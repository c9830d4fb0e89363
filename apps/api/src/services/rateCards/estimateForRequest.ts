import type { EstimateDto } from '@kerfmark/contracts';
import { estimateFromCard } from '@kerfmark/pricing';
import type { AuthUser } from '../../auth/passport';
import { HttpError } from '../../lib/httpError';
import type { ServiceDeps } from '../deps';
import { primaryFile } from '../../dto/requestViews';
import { findVisible } from '../requests/requestLookup';
import { rateCardOf } from './rateCardRow';

/**
 * The bid lines the shop's rate card gives for a request it may see: the measured whole die
 * (stepped and repeated when the file is one up) and the request's wants (counter, rubber).
 */
export async function estimateForRequest(
  { knex }: Pick<ServiceDeps, 'knex'>,
  actor: AuthUser,
  requestId: number,
  opts: { leadDays: number; boardThicknessIn?: number },
): Promise<EstimateDto> {
  const request = await findVisible(actor, requestId);
  await request.$fetchGraph('files');
  const card = await rateCardOf(knex, actor.organisationId);
  if (!card) {
    throw new HttpError(
      409,
      'no_rate_card',
      'Your shop has no rate card yet: an admin fills it in on the Rate card page.',
    );
  }
  const file = primaryFile(request.files);
  const m = file?.analysisStatus === 'done' ? file.metrics : null;
  if (!m)
    throw new HttpError(409, 'not_measured', 'The dieline is not measured yet, so there is nothing to price from.');
  if (opts.boardThicknessIn !== undefined && !card.boardPerSqIn.some((b) => b.thicknessIn === opts.boardThicknessIn)) {
    throw new HttpError(400, 'no_board_rate', `Your rate card has no rate for ${opts.boardThicknessIn} in board.`, {
      boardThicknessIn: 'Choose a board on your rate card',
    });
  }
  const estimate = estimateFromCard(card, {
    dieline: m,
    counter: request.counterWanted,
    ejectionRubber: request.ejectionRubberWanted,
    leadDays: opts.leadDays,
    boardThicknessIn: opts.boardThicknessIn,
  });
  const ruleIn = m.length.cut + m.length.crease + m.length.perf + m.length.kiss;
  return {
    ...estimate,
    basis: {
      ruleIn,
      bends: m.bends,
      joints: m.joints,
      punches: m.punches,
      boardSqIn: m.board.width * m.board.height,
      oneUp: Boolean(m.layout),
    },
  };
}
