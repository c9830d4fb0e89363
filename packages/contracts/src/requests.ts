import { inchesAndMm, PIECE_GRAINS } from '@kerfmark/dieline';
import { STOCK_KINDS } from '@kerfmark/stock';
import { z } from 'zod';
import { requestStatuses } from './requestStatus';
import { calendarDate, instant } from './dateFields';
import { recordId } from './ids';
import { ruleTypes } from './ruleTypes';

export const RequestStatus = z.enum(requestStatuses);
export type RequestStatus = z.infer<typeof RequestStatus>;

export const RuleType = z.enum(ruleTypes);
export type RuleType = z.infer<typeof RuleType>;

export const Grain = z.enum(['long', 'short']);
export type Grain = z.infer<typeof Grain>;
/** What the uploaded dieline shows: the whole die, or one up to be stepped and repeated. */
export const DielineShows = z.enum(['whole-die', 'one-up']);
export type DielineShows = z.infer<typeof DielineShows>;
export const PieceGrain = z.enum(PIECE_GRAINS);
export type PieceGrain = z.infer<typeof PieceGrain>;
export const Visibility = z.enum(['public', 'invited']);
export type Visibility = z.infer<typeof Visibility>;

const IsoDate = calendarDate();
const Instant = instant();
const Inches = (what: string) =>
  z
    .number({ error: `Enter ${what}` })
    .positive(`${what} must be more than 0`)
    .max(120, `${what} is at most ${inchesAndMm(120)}`);
/** Ups in one direction of a one-up layout. */
const upsInLine = (way: 'across' | 'along') =>
  z
    .number({ error: `Enter the ups ${way}` })
    .int('A whole number of ups')
    .min(1, 'At least 1 up')
    .max(100, 'At most 100 ups')
    .nullable()
    .optional();
const optionalText = (max: number) => z.string().trim().max(max, `At most ${max} characters`).nullable().optional();

/**
 * Everything a buyer fills in; a draft may leave most of it empty, publishing needs it complete.
 * No field here has a default: the create schema adds them, so the update schema (built with
 * .partial()) never fills in a field the update did not name, which zod 4 would do.
 */
const DieRequestFields = z.object({
  title: z.string({ error: 'Enter a title' }).trim().min(1, 'Enter a title').max(160, 'At most 160 characters'),
  jobReference: optionalText(60),
  quantity: z
    .number({ error: 'Enter how many dies' })
    .int('A whole number of dies')
    .min(1, 'At least 1 die')
    .max(100, 'At most 100 dies'),
  ups: z
    .number({ error: 'Enter the number of ups' })
    .int('A whole number of ups')
    .min(1, 'At least 1 up')
    .max(500, 'At most 500 ups'),
  dielineShows: DielineShows,
  upsAcross: upsInLine('across'),
  upsAlong: upsInLine('along'),
  gutterIn: z
    .number({ error: 'Enter the gutter' })
    .min(0, '0 or more (0 for shared cuts)')
    .max(10, `At most ${inchesAndMm(10)}`)
    .nullable()
    .optional(),
  pieceGrain: PieceGrain.nullable().optional(),
  pieceWidthIn: Inches('The finished width').nullable().optional(),
  pieceHeightIn: Inches('The finished height').nullable().optional(),
  stockName: optionalText(120),
  // Paperboard caliper: 0.001 in (1 pt) to 0.5 in covers folding carton to heavy corrugated.
  caliperIn: z
    .number({ error: 'Enter the caliper' })
    .min(0.001, `At least ${inchesAndMm(0.001)}`)
    .max(0.5, `At most ${inchesAndMm(0.5)}`)
    .nullable()
    .optional(),
  // Corrugated only: the board pressed flat under the creasing rule, thinner than its caliper.
  crushedCaliperIn: z
    .number({ error: 'Enter the crushed thickness' })
    .min(0.001, `At least ${inchesAndMm(0.001)}`)
    .max(0.5, `At most ${inchesAndMm(0.5)}`)
    .nullable()
    .optional(),
  stockWeightGsm: z
    .number({ error: 'Enter the stock weight' })
    .min(20, 'At least 20 g/m²')
    .max(3000, 'At most 3,000 g/m²')
    .nullable()
    .optional(),
  grain: Grain.nullable().optional(),
  stockKind: z.enum(STOCK_KINDS),
  /** The weight as the buyer entered it, e.g. "80 lb cover"; stockWeightGsm holds it in g/m². */
  stockWeightEntry: optionalText(40),
  foldAcrossGrain: z.boolean().nullable().optional(),
  heavyInkOnFold: z.boolean().nullable().optional(),
  colourBreakOnFold: z.boolean().nullable().optional(),
  pressId: recordId(z.number(), 'Choose one of your presses').nullable().optional(),
  runSheets: z
    .number({ error: 'Enter the sheets to run' })
    .int('A whole number of sheets')
    .min(1)
    .max(10_000_000)
    .nullable()
    .optional(),
  plannedLeadDays: z.number().int().min(1, 'At least 1 working day').max(60, 'At most 60 working days'),
  ruleTypes: z.array(RuleType).min(1, 'Choose at least one rule type').max(4),
  counterWanted: z.boolean(),
  ejectionRubberWanted: z.boolean(),
  needByDate: IsoDate.nullable().optional(),
  bidDeadline: Instant.nullable().optional(),
  deliveryAddress: optionalText(500),
  deliveryPostcode: z.string().trim().max(12, 'At most 12 characters').nullable().optional(),
  notes: optionalText(4000),
  visibility: Visibility,
  invitedShopIds: z.array(recordId(z.number(), 'Choose die shops from the list')).max(50),
});

const { shape } = DieRequestFields;
export const DieRequestCreate = DieRequestFields.extend({
  dielineShows: shape.dielineShows.default('whole-die'),
  stockKind: shape.stockKind.default('paperboard'),
  plannedLeadDays: shape.plannedLeadDays.default(5),
  counterWanted: shape.counterWanted.default(false),
  ejectionRubberWanted: shape.ejectionRubberWanted.default(true),
  visibility: shape.visibility.default('public'),
  invitedShopIds: shape.invitedShopIds.default([]),
});
export type DieRequestCreate = z.input<typeof DieRequestCreate>;
export const DieRequestUpdate = DieRequestFields.partial().refine((v) => Object.keys(v).length > 0, {
  error: 'Nothing to change',
});
export type DieRequestUpdate = z.input<typeof DieRequestUpdate>;

/** What publishing needs on top of a draft: dates, stock and where the die goes. */
export const PublishReady = z
  .object({
    caliperIn: z.number({ error: 'Enter the caliper before publishing' }),
    stockName: z.string({ error: 'Name the stock before publishing' }).min(1, 'Name the stock before publishing'),
    needByDate: IsoDate,
    bidDeadline: Instant,
    deliveryPostcode: z.string({ error: 'Enter the delivery postcode' }).min(3, 'Enter the delivery postcode'),
  })
  .refine((v) => new Date(v.bidDeadline).getTime() > Date.now(), {
    error: 'The bid deadline must be in the future',
    path: ['bidDeadline'],
  })
  .refine((v) => v.needByDate >= v.bidDeadline.slice(0, 10), {
    error: 'The need-by date cannot be before the bid deadline',
    path: ['needByDate'],
  });

export const RequestListQuery = z.object({
  status: RequestStatus.optional(),
  pressId: recordId(z.coerce.number(), 'Choose one of your presses').optional(),
  needByFrom: IsoDate.optional(),
  needByTo: IsoDate.optional(),
  q: z.string().trim().max(100).optional(),
  sort: z
    .enum(['needByDate', '-needByDate', 'bidDeadline', '-bidDeadline', 'createdAt', '-createdAt', 'title'])
    .default('-createdAt'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type RequestListQuery = z.input<typeof RequestListQuery>;

/** The die shops' list of open requests: filters, sort and page, all applied by the server. */
export const OpenRequestsQuery = z.object({
  q: z.string().trim().max(100).optional(),
  minIn: z.coerce.number().min(0).max(1_000_000).optional(),
  maxIn: z.coerce.number().min(0).max(1_000_000).optional(),
  complexity: z.enum(['simple', 'complex']).optional(),
  /** Bids due within this many days from now. */
  withinDays: z.coerce.number().int().min(1).max(365).optional(),
  /** Comma-separated: every one of these rule types must be on the request. */
  ruleTypes: z
    .string()
    .max(100)
    .transform((s) =>
      s
        .split(',')
        .map((t) => t.trim())
        .filter(Boolean),
    )
    .pipe(z.array(RuleType))
    .optional(),
  hideDeclined: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .default(true),
  /** Only the dies the shop can make, by its profile's capabilities. */
  canMake: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .default(true),
  sort: z
    .enum([
      'bidDeadline',
      '-bidDeadline',
      'needByDate',
      '-needByDate',
      'ruleLength',
      '-ruleLength',
      'distance',
      '-distance',
    ])
    .default('bidDeadline'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type OpenRequestsQuery = z.input<typeof OpenRequestsQuery>;

export const QuestionCreate = z.object({
  question: z
    .string({ error: 'Write your question' })
    .trim()
    .min(3, 'Write your question')
    .max(2000, 'At most 2,000 characters'),
});
export const AnswerCreate = z.object({
  answer: z
    .string({ error: 'Write the answer' })
    .trim()
    .min(1, 'Write the answer')
    .max(4000, 'At most 4,000 characters'),
});
/** The PDF page to measure; null measures the first page with stroked lines. */
export const PdfPageUpdate = z.object({
  page: z.number({ error: 'Choose a page' }).int('Choose a page').min(1, 'Pages start at 1').max(9999).nullable(),
});

export const LayerMapUpdate = z.object({
  layerMap: z.record(z.string().max(255), z.enum(['cut', 'crease', 'perf', 'kiss', 'other'])),
});
