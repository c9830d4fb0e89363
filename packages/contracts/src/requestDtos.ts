import type { Complexity, DielineMetrics, LengthByType } from '@kerfmark/dieline';
import type { StockKind } from '@kerfmark/stock';
import type { BidDto } from './bids';
import type { Press } from './presses';
import type { DielineShows, Grain, PieceGrain, RequestStatus, RuleType, Visibility } from './requests';
import type { RequestAction } from './requestStatus';

/** The dieline metrics as the analysis reports them (lengths in inches): the dieline package's own type. */
export type { DielineMetrics } from '@kerfmark/dieline';

export type AnalysisStatus = 'pending' | 'analysing' | 'done' | 'failed';

export interface DielineFileDto {
  id: number;
  fileName: string;
  format: 'dxf' | 'svg' | 'pdf';
  byteSize: number;
  sha256: string;
  isPrimary: boolean;
  uploadedAt: string;
  analysisStatus: AnalysisStatus;
  analysisError: string | null;
  metrics: DielineMetrics | null;
  layerMap: Record<string, string>;
  /** A PDF's page the buyer chose to measure; null: the first with stroked lines. */
  pdfPage: number | null;
}

export interface DieRequestSummary {
  id: number;
  title: string;
  jobReference: string | null;
  status: RequestStatus;
  organisationName: string;
  quantity: number;
  ups: number;
  ruleTypes: RuleType[];
  needByDate: string | null;
  bidDeadline: string | null;
  pressName: string | null;
  deliveryPostcode: string | null;
  visibility: Visibility;
  metrics: DielineMetrics | null;
  analysisStatus: AnalysisStatus | null;
  createdAt: string;
  updatedAt: string;
}

/**
 * One row of the die shops' board: only what the board shows. The full metrics, layers and
 * warnings are on the request page.
 */
export interface OpenRequestRow {
  id: number;
  title: string;
  jobReference: string | null;
  organisationName: string;
  quantity: number;
  ups: number;
  ruleTypes: RuleType[];
  needByDate: string | null;
  bidDeadline: string | null;
  deliveryPostcode: string | null;
  /** Rule length by rule type, in inches, once the dieline is measured. */
  length: LengthByType | null;
  complexity: Complexity | null;
  analysisStatus: AnalysisStatus | null;
  /** Straight-line miles from the shop to the delivery postcode, when both are known. */
  distanceMiles: number | null;
  /** The shop said it is not bidding, or it has bid. */
  declined: boolean;
  hasBid: boolean;
}

export interface RequestQuestionDto {
  id: number;
  question: string;
  askedAt: string;
  /** Only the printer and the asking shop see who asked. */
  askedByYou: boolean;
  answer: string | null;
  answeredAt: string | null;
}

export interface NeedByPlan {
  runHours: number | null;
  runDays: number;
  dieReadyBy: string;
  latestArrival: string;
  slackDays: number;
  ok: boolean;
}

export interface DieRequestDetail extends DieRequestSummary {
  dielineShows: DielineShows;
  upsAcross: number | null;
  upsAlong: number | null;
  gutterIn: number | null;
  pieceGrain: PieceGrain | null;
  pieceWidthIn: number | null;
  pieceHeightIn: number | null;
  stockName: string | null;
  caliperIn: number | null;
  crushedCaliperIn: number | null;
  stockWeightGsm: number | null;
  grain: Grain | null;
  stockKind: StockKind;
  stockWeightEntry: string | null;
  foldAcrossGrain: boolean | null;
  heavyInkOnFold: boolean | null;
  colourBreakOnFold: boolean | null;
  pressId: number | null;
  press: Press | null;
  runSheets: number | null;
  plannedLeadDays: number;
  counterWanted: boolean;
  ejectionRubberWanted: boolean;
  deliveryAddress: string | null;
  notes: string | null;
  invitedShops: Array<{ id: number; name: string }>;
  files: DielineFileDto[];
  questions: RequestQuestionDto[];
  allowedActions: RequestAction[];
  isOwner: boolean;
  boardFitsPress: boolean | null;
  needBy: NeedByPlan | null;
  /** Bids can be sent or changed now. */
  biddingOpen: boolean;
  /** A die shop's own bid on this request. */
  myBid: BidDto | null;
  /** What a die shop learns after the award: only whether it won. */
  outcome: 'won' | 'not_awarded' | null;
  /** The award: the printer sees it whole; the winning shop sees its purchase order. */
  award: {
    id: number;
    poNumber: string;
    shopName: string | null;
    totalCents: number;
    currency: string;
    promisedShipDate: string;
    reason: string | null;
  } | null;
  trackingNote: string | null;
  shippedAt: string | null;
  receivedAt: string | null;
  receivedCondition: 'good' | 'damaged' | null;
  /** Set the day after the promised ship date passed with the die unshipped. */
  lateFlaggedAt: string | null;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
