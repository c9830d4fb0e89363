import { Model } from 'objection';
import type { DielineShows, Grain, PieceGrain, RequestStatus, RuleType, Visibility } from '@kerfmark/contracts';
import { DielineFile } from './DielineFile';
import { Organisation } from './Organisation';
import { Press } from './Press';
import type { RequestQuestion } from './RequestQuestion';
import type { Award } from './Award';
import type { SubmittedBid } from './SubmittedBid';

/** The shops tied to a request, as readRequestGraph's `ties` part reads them in the same query. */
export interface RequestTies {
  invitedShopIds: number[];
  bidderShopIds: number[];
  awardedShopId: number | null;
}

export class DieRequest extends Model {
  static override tableName = 'die_requests';

  id!: number;
  organisationId!: number;
  createdBy!: number | null;
  title!: string;
  jobReference!: string | null;
  status!: RequestStatus;
  quantity!: number;
  ups!: number;
  dielineShows!: DielineShows;
  upsAcross!: number | null;
  upsAlong!: number | null;
  gutterIn!: number | null;
  pieceGrain!: PieceGrain | null;
  pieceWidthIn!: number | null;
  pieceHeightIn!: number | null;
  stockName!: string | null;
  caliperIn!: number | null;
  crushedCaliperIn!: number | null;
  stockWeightGsm!: number | null;
  grain!: Grain | null;
  stockKind!: 'paper' | 'paperboard' | 'corrugated';
  stockWeightEntry!: string | null;
  foldAcrossGrain!: boolean | null;
  heavyInkOnFold!: boolean | null;
  colourBreakOnFold!: boolean | null;
  pressId!: number | null;
  runSheets!: number | null;
  plannedLeadDays!: number;
  ruleTypes!: RuleType[];
  counterWanted!: boolean;
  ejectionRubberWanted!: boolean;
  needByDate!: string | null;
  bidDeadline!: Date | null;
  deliveryAddress!: string | null;
  deliveryPostcode!: string | null;
  notes!: string | null;
  visibility!: Visibility;
  publishedAt!: Date | null;
  biddingClosedAt!: Date | null;
  closedEarly!: boolean;
  productionStartedAt!: Date | null;
  shippedAt!: Date | null;
  trackingNote!: string | null;
  receivedAt!: Date | null;
  receivedCondition!: 'good' | 'damaged' | null;
  receivedNotes!: string | null;
  lateFlaggedAt!: Date | null;
  createdAt!: Date;
  updatedAt!: Date;
  /** Stamped by the database on every update (migration 20261204000800); the board's tag reads it. */
  changedAt!: Date;
  organisation?: Organisation;
  press?: Press | null;
  files?: DielineFile[];
  invitedShops?: Organisation[];
  /** The shops tied to it, read with the request by readRequestGraph for the access rules. */
  ties?: RequestTies;
  /** Read with the request by readRequestGraph. */
  award?: Award | null;
  questions?: RequestQuestion[];
  submittedBids?: SubmittedBid[];

  static override get relationMappings() {
    return {
      organisation: {
        relation: Model.BelongsToOneRelation,
        modelClass: Organisation,
        join: { from: 'die_requests.organisationId', to: 'organisations.id' },
      },
      press: {
        relation: Model.BelongsToOneRelation,
        modelClass: Press,
        join: { from: 'die_requests.pressId', to: 'presses.id' },
      },
      files: {
        relation: Model.HasManyRelation,
        modelClass: DielineFile,
        join: { from: 'die_requests.id', to: 'dieline_files.requestId' },
      },
      invitedShops: {
        relation: Model.ManyToManyRelation,
        modelClass: Organisation,
        join: {
          from: 'die_requests.id',
          through: { from: 'request_invitations.requestId', to: 'request_invitations.shopId' },
          to: 'organisations.id',
        },
      },
    };
  }

  override $beforeUpdate(): void {
    this.updatedAt = new Date();
  }
}
