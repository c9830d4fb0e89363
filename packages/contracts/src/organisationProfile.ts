import { inchesAndMm } from '@kerfmark/dieline';
import { CUTTING_RULE_HEIGHTS_IN } from '@kerfmark/stock';
import { z } from 'zod';
import { Email } from './auth';
import type { OrgKind } from './roleSchemas';

/** The kinds of steel-rule die a die shop makes. */
export const dieKinds = ['flat', 'rotary'] as const;
export const DieKind = z.enum(dieKinds, { error: 'Choose flat or rotary' });
export type DieKind = z.infer<typeof DieKind>;

export const dieKindLabels: Record<DieKind, string> = {
  flat: 'Flat',
  rotary: 'Rotary',
};

export type CuttingRuleHeightIn = (typeof CUTTING_RULE_HEIGHTS_IN)[number];

/** Text that may be left empty: an empty box clears the field. */
const optionalText = (what: string, max: number) =>
  z
    .string({ error: `Enter ${what}` })
    .trim()
    .max(max, `At most ${max} characters`)
    .transform((v) => (v === '' ? null : v))
    .nullable();

const requiredText = (what: string, max: number) =>
  z
    .string({ error: `Enter ${what}` })
    .trim()
    .min(1, `Enter ${what}`)
    .max(max, `At most ${max} characters`);

const Postcode = optionalText('a postcode', 12);

export const DeliveryPoint = z.object({
  name: requiredText('a name for the delivery point', 120),
  address: requiredText('the address', 500),
  postcode: Postcode.optional().transform((v) => v ?? null),
});
export type DeliveryPoint = z.output<typeof DeliveryPoint>;

/** Every value in the list once. */
const distinct = <T extends z.ZodType>(item: T, what: string, max: number) =>
  z
    .array(item, { error: `Choose the ${what}` })
    .max(max, `At most ${max} ${what}`)
    .refine((list) => new Set(list).size === list.length, { error: `Name each of the ${what} once` });

// A die board is cut from a sheet of plywood; 200 in each way is far past any die-cutting press
// (common practice: a small press takes about 22 × 30 in, large flatbeds about 60 × 80 in).
const BoardSide = z
  .number({ error: 'Enter a size' })
  .min(1, `A board side is at least ${inchesAndMm(1)}`)
  .max(200, `A board side is at most ${inchesAndMm(200)}`)
  .nullable();

const CuttingRuleHeight = z.union(
  CUTTING_RULE_HEIGHTS_IN.map((h) => z.literal(h)),
  { error: `Choose a cutting rule height: ${CUTTING_RULE_HEIGHTS_IN.join(' in or ')} in` },
);

const yesNo = (what: string) => z.boolean({ error: `Choose whether the shop ${what}` }).nullable();

/** The profile's fields, each of them optional in an update; the kind of organisation decides which apply. */
const ProfileFields = z.object({
  /** The registered name printed on purchase orders; the organisation's display name stays as it is. */
  legalName: optionalText('the legal name', 200),
  /** The office address, one line per line. */
  officeAddress: optionalText('the office address', 500),
  postcode: Postcode,
  contactEmail: z
    .literal('')
    .transform(() => null)
    .or(Email)
    .nullable(),
  // Printers.
  paymentTerms: optionalText('the payment terms', 120),
  /** Days from an invoice's date to its due date; when not set, the days the payment terms name ("Net 30"). */
  paymentNetDays: z
    .number({ error: 'Enter the days to pay as a whole number' })
    .int('Enter whole days')
    .min(0, 'At least 0 days (due on receipt)')
    .max(365, 'At most 365 days')
    .nullable(),
  deliveryPoints: z
    .array(DeliveryPoint, { error: 'Enter the delivery points' })
    .max(30, 'At most 30 delivery points')
    .refine((points) => new Set(points.map((p) => p.name.toLowerCase())).size === points.length, {
      error: 'Give each delivery point a name of its own',
    }),
  // Die shops.
  dieKinds: distinct(DieKind, 'die kinds', dieKinds.length),
  maxBoardWidthIn: BoardSide,
  maxBoardLengthIn: BoardSide,
  ruleHeightsIn: distinct(CuttingRuleHeight, 'cutting rule heights', CUTTING_RULE_HEIGHTS_IN.length),
  makesCounters: yesNo('makes counters'),
  fitsEjectionRubber: yesNo('fits ejection rubber'),
  laserCutBoards: yesNo('cuts its die boards by laser'),
});

export const printerProfileFields = ['paymentTerms', 'paymentNetDays', 'deliveryPoints'] as const;
export const dieShopProfileFields = [
  'dieKinds',
  'maxBoardWidthIn',
  'maxBoardLengthIn',
  'ruleHeightsIn',
  'makesCounters',
  'fitsEjectionRubber',
  'laserCutBoards',
] as const;
type ProfileField = keyof z.infer<typeof ProfileFields>;

/** The fields an organisation of this kind may not set: the other kind's. */
export function fieldsNotFor(kind: OrgKind): readonly ProfileField[] {
  return kind === 'printer' ? dieShopProfileFields : printerProfileFields;
}

/** A change to the organisation's profile: only the fields named change. */
export const OrganisationProfileUpdate = ProfileFields.partial().refine((v) => Object.keys(v).length > 0, {
  error: 'Nothing to change',
});
export type OrganisationProfileUpdate = z.infer<typeof OrganisationProfileUpdate>;

interface ProfileCommon {
  organisationId: number;
  /** The name shown across Kerfmark. */
  name: string;
  legalName: string | null;
  officeAddress: string | null;
  postcode: string | null;
  contactEmail: string | null;
  /** Whether the reader may change it: the organisation's admins may. */
  editable: boolean;
}

export interface PrinterProfileDto extends ProfileCommon {
  kind: 'printer';
  paymentTerms: string | null;
  paymentNetDays: number | null;
  deliveryPoints: DeliveryPoint[];
}

export interface DieShopProfileDto extends ProfileCommon {
  kind: 'die_shop';
  dieKinds: DieKind[];
  maxBoardWidthIn: number | null;
  maxBoardLengthIn: number | null;
  ruleHeightsIn: CuttingRuleHeightIn[];
  makesCounters: boolean | null;
  fitsEjectionRubber: boolean | null;
  laserCutBoards: boolean | null;
}

export type OrganisationProfileDto = PrinterProfileDto | DieShopProfileDto;
