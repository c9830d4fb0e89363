import type { DisplayLocale, LengthUnits } from '@kerfmark/contracts';
import type { Complexity, Size } from '@kerfmark/dieline';
/** What a purchase order document says; money in integer cents (minor units) with its currency. */
export interface PurchaseOrderDoc {
  poNumber: string;
  issuedAt: Date;
  timeZone: string;
  /** How the issuer reads it: lengths in their units (the other beside), dates and numbers in their locale. */
  units: LengthUnits;
  locale: DisplayLocale;
  /** Letter in North America, A4 elsewhere, by the issuing printer's country. */
  paper: 'LETTER' | 'A4';
  /** The printer that issues the order: its legal name (else its name), office and payment terms. */
  buyer: {
    organisation: string;
    officeAddress: string | null;
    postcode: string | null;
    paymentTerms: string | null;
    contact: string;
    email: string;
    deliveryAddress: string | null;
    deliveryPostcode: string | null;
  };
  /** The die shop the order goes to. */
  supplier: { organisation: string; officeAddress: string | null; postcode: string | null; email: string | null };
  request: {
    id: number;
    title: string;
    jobReference: string | null;
    needByDate: string | null;
    quantity: number;
    ups: number;
  };
  dieline: { fileName: string; totalRuleIn: number; board: Size | null; complexity: Complexity } | null;
  lines: Array<{ kind: string; description: string; amountCents: number }>;
  totalCents: number;
  currency: string;
  leadDays: number;
  promisedShipDate: string;
  bidRevision: number;
  awardReason: string | null;
  notes: string | null;
}

/** Everything the Open Contracting release of one awarded request is built from. */
export interface OcdsInput {
  ocidPrefix: string; // e.g. 'ocds-kerfmark'
  request: {
    id: number;
    title: string;
    description: string | null;
    status: string; // our request status
    publishedAt: Date | null;
    bidDeadline: Date | null;
    needByDate: string | null;
    quantity: number;
  };
  buyer: { id: number; name: string };
  bids: Array<{
    id: number;
    shop: { id: number; name: string };
    status: 'submitted' | 'withdrawn';
    submittedAt: Date;
    totalCents: number;
    currency: string;
  }>;
  award: {
    id: number;
    bidId: number;
    shop: { id: number; name: string };
    awardedAt: Date;
    totalCents: number;
    currency: string;
    reason: string | null;
  };
  purchaseOrder: { poNumber: string; issuedAt: Date; status: 'active' | 'terminated' };
  releasedAt: Date;
}
