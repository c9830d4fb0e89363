import { Model } from 'objection';
import type {
  CuttingRuleHeightIn,
  DeliveryPoint,
  DieKind,
  DisplayLocale,
  LengthUnits,
  OrgKind,
} from '@kerfmark/contracts';

export class Organisation extends Model {
  static override tableName = 'organisations';

  id!: number;
  name!: string;
  kind!: OrgKind;
  timeZone!: string;
  postcode!: string | null;
  country!: string;
  createdAt!: Date;
  /** Inches or millimetres by default for its people (migration 20261204000600). */
  lengthUnits!: LengthUnits;
  /** en-US or en-GB by default for its people (migration 20261204000700). */
  locale!: DisplayLocale;
  // The profile (migration 20261204000200): the legal name and address purchase orders print.
  legalName!: string | null;
  officeAddress!: string | null;
  contactEmail!: string | null;
  // A printer's.
  paymentTerms!: string | null;
  /** The printer's own net days for invoices; null reads them from `paymentTerms` (migration 20261205000100). */
  paymentNetDays!: number | null;
  /** The largest difference the three-way match lets through unflagged, in minor units. */
  invoiceToleranceCents!: number;
  deliveryPoints!: DeliveryPoint[];
  // A die shop's capabilities; null where not stated.
  dieKinds!: DieKind[];
  maxBoardWidthIn!: number | null;
  maxBoardLengthIn!: number | null;
  /** A numeric[]: pg reads it as numbers (pg-types' float array parser). */
  ruleHeightsIn!: CuttingRuleHeightIn[];
  makesCounters!: boolean | null;
  fitsEjectionRubber!: boolean | null;
  laserCutBoards!: boolean | null;

  static override get jsonAttributes() {
    return ['deliveryPoints'];
  }
}
