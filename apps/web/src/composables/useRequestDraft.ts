import type {
  DielineShows,
  DieRequestCreate,
  DieRequestDetail,
  Grain,
  PieceGrain,
  RuleType,
  Visibility,
} from '@kerfmark/contracts';
import { instantOfWallClock, wallClockIn } from '@kerfmark/contracts';
import { basisWeightToGsm, gsmToBasisWeight } from '@kerfmark/stock';
import dayjs, { type Dayjs } from 'dayjs';
import { inject, provide, reactive, type InjectionKey } from 'vue';

/** The request form's state, in the units people type (caliper in points), and its conversion. */
export interface RequestForm {
  title: string;
  jobReference: string;
  quantity: number;
  ups: number;
  dielineShows: DielineShows;
  upsAcross: number | undefined;
  upsAlong: number | undefined;
  gutterIn: number | undefined;
  pieceGrain: PieceGrain;
  pieceWidthIn: number | undefined;
  pieceHeightIn: number | undefined;
  stockName: string;
  caliperPt: number | undefined;
  /** Corrugated only, in points like the caliper. */
  crushedPt: number | undefined;
  /** The weight as typed, in g/m² or in pounds of a US basis grade. */
  stockWeight: number | undefined;
  weightUnit: WeightUnit;
  stockKind: 'paper' | 'paperboard' | 'corrugated';
  grain: Grain | undefined;
  foldAcrossGrain: boolean | undefined;
  heavyInkOnFold: boolean | undefined;
  colourBreakOnFold: boolean | undefined;
  ruleTypes: RuleType[];
  counterWanted: boolean;
  ejectionRubberWanted: boolean;
  pressId: number | undefined;
  runSheets: number | undefined;
  plannedLeadDays: number;
  needByDate: Dayjs | undefined;
  bidDeadline: Dayjs | undefined;
  deliveryAddress: string;
  deliveryPostcode: string;
  visibility: Visibility;
  invitedShopIds: number[];
  notes: string;
}

export type WeightUnit = 'gsm' | 'text' | 'cover' | 'bristol' | 'index' | 'bond';
export const weightUnitLabels: Record<WeightUnit, string> = {
  gsm: 'g/m²',
  text: 'lb text',
  cover: 'lb cover',
  bristol: 'lb bristol',
  index: 'lb index',
  bond: 'lb bond',
};

/** The weight in g/m², converted from a US basis weight by its basis size when needed. */
export function weightInGsm(value: number | undefined, unit: WeightUnit): number | null {
  if (!value) return null;
  return unit === 'gsm' ? value : Math.round(basisWeightToGsm(value, unit) * 10) / 10;
}

export function emptyRequestForm(): RequestForm {
  return {
    title: '',
    jobReference: '',
    quantity: 1,
    ups: 1,
    dielineShows: 'whole-die',
    upsAcross: undefined,
    upsAlong: undefined,
    gutterIn: 0,
    pieceGrain: 'either',
    pieceWidthIn: undefined,
    pieceHeightIn: undefined,
    stockName: '',
    caliperPt: undefined,
    crushedPt: undefined,
    stockWeight: undefined,
    weightUnit: 'gsm',
    stockKind: 'paperboard',
    grain: undefined,
    foldAcrossGrain: undefined,
    heavyInkOnFold: undefined,
    colourBreakOnFold: undefined,
    ruleTypes: ['cut', 'crease'],
    counterWanted: false,
    ejectionRubberWanted: true,
    pressId: undefined,
    runSheets: undefined,
    plannedLeadDays: 5,
    needByDate: undefined,
    bidDeadline: undefined,
    deliveryAddress: '',
    deliveryPostcode: '',
    visibility: 'public',
    invitedShopIds: [],
    notes: '',
  };
}

const blankToNull = (value: string) => (value.trim() === '' ? null : value.trim());

/** 1 pt of caliper = 0.001 in (the North American board convention). */
export function toRequestInput(form: RequestForm, timeZone: string): DieRequestCreate {
  return {
    title: form.title,
    jobReference: blankToNull(form.jobReference),
    quantity: form.quantity,
    ups: form.ups,
    dielineShows: form.dielineShows,
    ...(form.dielineShows === 'one-up'
      ? {
          upsAcross: form.upsAcross ?? null,
          upsAlong: form.upsAlong ?? null,
          gutterIn: form.gutterIn ?? 0,
          pieceGrain: form.pieceGrain,
        }
      : { upsAcross: null, upsAlong: null, gutterIn: null, pieceGrain: null }),
    pieceWidthIn: form.pieceWidthIn ?? null,
    pieceHeightIn: form.pieceHeightIn ?? null,
    stockName: blankToNull(form.stockName),
    caliperIn: form.caliperPt ? Math.round(form.caliperPt * 10) / 10000 : null,
    crushedCaliperIn:
      form.stockKind === 'corrugated' && form.crushedPt ? Math.round(form.crushedPt * 10) / 10000 : null,
    stockWeightGsm: weightInGsm(form.stockWeight, form.weightUnit),
    stockWeightEntry: form.stockWeight ? `${form.stockWeight} ${weightUnitLabels[form.weightUnit]}` : null,
    stockKind: form.stockKind,
    grain: form.grain ?? null,
    foldAcrossGrain: form.foldAcrossGrain ?? null,
    heavyInkOnFold: form.heavyInkOnFold ?? null,
    colourBreakOnFold: form.colourBreakOnFold ?? null,
    ruleTypes: form.ruleTypes,
    counterWanted: form.counterWanted,
    ejectionRubberWanted: form.ejectionRubberWanted,
    pressId: form.pressId ?? null,
    runSheets: form.runSheets ?? null,
    plannedLeadDays: form.plannedLeadDays,
    needByDate: form.needByDate ? form.needByDate.format('YYYY-MM-DD') : null,
    // The picker holds the organisation's wall clock, whatever the browser's own zone.
    bidDeadline: form.bidDeadline
      ? instantOfWallClock(form.bidDeadline.format('YYYY-MM-DDTHH:mm:ss'), timeZone).toISOString()
      : null,
    deliveryAddress: blankToNull(form.deliveryAddress),
    deliveryPostcode: blankToNull(form.deliveryPostcode),
    visibility: form.visibility,
    invitedShopIds: form.visibility === 'invited' ? form.invitedShopIds : [],
    notes: blankToNull(form.notes),
  };
}

export function fromRequest(request: DieRequestDetail, timeZone: string): RequestForm {
  return {
    title: request.title,
    jobReference: request.jobReference ?? '',
    quantity: request.quantity,
    ups: request.ups,
    dielineShows: request.dielineShows,
    upsAcross: request.upsAcross ?? undefined,
    upsAlong: request.upsAlong ?? undefined,
    gutterIn: request.gutterIn ?? 0,
    pieceGrain: request.pieceGrain ?? 'either',
    pieceWidthIn: request.pieceWidthIn ?? undefined,
    pieceHeightIn: request.pieceHeightIn ?? undefined,
    stockName: request.stockName ?? '',
    caliperPt: request.caliperIn ? Math.round(request.caliperIn * 10000) / 10 : undefined,
    crushedPt: request.crushedCaliperIn ? Math.round(request.crushedCaliperIn * 10000) / 10 : undefined,
    ...weightFromEntry(request.stockWeightEntry, request.stockWeightGsm),
    stockKind: request.stockKind,
    grain: request.grain ?? undefined,
    foldAcrossGrain: request.foldAcrossGrain ?? undefined,
    heavyInkOnFold: request.heavyInkOnFold ?? undefined,
    colourBreakOnFold: request.colourBreakOnFold ?? undefined,
    ruleTypes: request.ruleTypes,
    counterWanted: request.counterWanted,
    ejectionRubberWanted: request.ejectionRubberWanted,
    pressId: request.pressId ?? undefined,
    runSheets: request.runSheets ?? undefined,
    plannedLeadDays: request.plannedLeadDays,
    needByDate: request.needByDate ? dayjs(request.needByDate) : undefined,
    bidDeadline: request.bidDeadline ? dayjs(wallClockIn(request.bidDeadline, timeZone)) : undefined,
    deliveryAddress: request.deliveryAddress ?? '',
    deliveryPostcode: request.deliveryPostcode ?? '',
    visibility: request.visibility,
    invitedShopIds: request.invitedShops.map((s) => s.id),
    notes: request.notes ?? '',
  };
}

/** Back to what the buyer typed: "80 lb cover" stays in pounds of cover; otherwise g/m². */
function weightFromEntry(
  entry: string | null,
  gsm: number | null,
): { stockWeight: number | undefined; weightUnit: WeightUnit } {
  const unit = (Object.entries(weightUnitLabels) as Array<[WeightUnit, string]>).find(([, label]) =>
    entry?.endsWith(` ${label}`),
  )?.[0];
  if (entry && unit) return { stockWeight: Number(entry.split(' ')[0]), weightUnit: unit };
  return { stockWeight: gsm ?? undefined, weightUnit: 'gsm' };
}

/** Shown beside the weight field: the other unit, so the buyer can check the conversion. */
export function weightHint(value: number | undefined, unit: WeightUnit): string | undefined {
  if (!value) return undefined;
  if (unit !== 'gsm') return `= ${weightInGsm(value, unit)} g/m²`;
  return `= ${Math.round(gsmToBasisWeight(value, 'cover'))} lb cover, ${Math.round(gsmToBasisWeight(value, 'text'))} lb text`;
}

const draftKey: InjectionKey<RequestForm> = Symbol('request-draft');

/** A new, empty draft, given to the form's steps below (injectRequestDraft). */
export function useRequestDraft(): RequestForm {
  const form = reactive(emptyRequestForm());
  provide(draftKey, form);
  return form;
}

/** The draft of the request form this step sits in. */
export function injectRequestDraft(): RequestForm {
  const form = inject(draftKey);
  if (!form) throw new Error('A request form step must sit inside the request form');
  return form;
}
