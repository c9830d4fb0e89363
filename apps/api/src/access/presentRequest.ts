import { pressHoursPerDay, type DieRequestDetail, type RequestQuestionDto } from '@kerfmark/contracts';
import { checkNeedBy, runHours } from '@kerfmark/pricing';
import { fitsPress } from '@kerfmark/dieline';
import type { AuthUser } from '../auth/passport';
import { todayIn } from '../lib/todayIn';
import type { DieRequest, RequestQuestion } from '../models';
import { primaryFile, toFileDto, toPressDto, toSummary } from '../dto/requestViews';

/** The parts of a request's page that differ by audience; the presenters fill them in. */
export type AudienceFields =
  | 'deliveryAddress'
  | 'invitedShops'
  | 'questions'
  | 'allowedActions'
  | 'isOwner'
  | 'biddingOpen'
  | 'myBid'
  | 'outcome'
  | 'award'
  | 'trackingNote'
  | 'receivedAt'
  | 'receivedCondition'
  | 'lateFlaggedAt';

/** What every audience that may see a request sees of it: the job, the stock, the press, the dieline. */
export function requestFields(request: DieRequest, actor: AuthUser): Omit<DieRequestDetail, AudienceFields> {
  const file = primaryFile(request.files);
  const board = file?.analysisStatus === 'done' ? file.metrics?.board : undefined;
  const press = request.press ?? null;
  const fits =
    board && press ? fitsPress(board, { widthIn: press.maxSheetWidthIn, lengthIn: press.maxSheetLengthIn }) : null;
  const hours = press && request.runSheets ? runHours(request.runSheets, press.typicalSpeedSph) : null;
  const needBy = request.needByDate
    ? {
        runHours: hours,
        ...checkNeedBy({
          today: todayIn(actor.timeZone),
          needByDate: request.needByDate,
          leadDays: request.plannedLeadDays,
          runHours: hours ?? 0,
          hoursPerDay: press ? pressHoursPerDay(press) : undefined,
        }),
      }
    : null;
  return {
    ...toSummary(request),
    dielineShows: request.dielineShows,
    upsAcross: request.upsAcross,
    upsAlong: request.upsAlong,
    gutterIn: request.gutterIn,
    pieceGrain: request.pieceGrain,
    pieceWidthIn: request.pieceWidthIn,
    pieceHeightIn: request.pieceHeightIn,
    stockName: request.stockName,
    caliperIn: request.caliperIn,
    crushedCaliperIn: request.crushedCaliperIn,
    stockWeightGsm: request.stockWeightGsm,
    grain: request.grain,
    stockKind: request.stockKind,
    stockWeightEntry: request.stockWeightEntry,
    foldAcrossGrain: request.foldAcrossGrain,
    heavyInkOnFold: request.heavyInkOnFold,
    colourBreakOnFold: request.colourBreakOnFold,
    pressId: request.pressId,
    press: press ? toPressDto(press) : null,
    runSheets: request.runSheets,
    plannedLeadDays: request.plannedLeadDays,
    counterWanted: request.counterWanted,
    ejectionRubberWanted: request.ejectionRubberWanted,
    notes: request.notes,
    files: (request.files ?? []).map(toFileDto),
    boardFitsPress: fits,
    needBy,
    shippedAt: request.shippedAt?.toISOString() ?? null,
  };
}

/** A question as the actor reads it; no audience learns which other shop asked. */
export function questionDto(actor: AuthUser, q: RequestQuestion): RequestQuestionDto {
  return {
    id: q.id,
    question: q.question,
    askedAt: q.askedAt.toISOString(),
    askedByYou: q.shopId === actor.organisationId,
    answer: q.answer,
    answeredAt: q.answeredAt?.toISOString() ?? null,
  };
}
