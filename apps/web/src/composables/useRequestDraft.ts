import type { DieRequestCreate, DieRequestDetail, Grain, RuleType, Visibility } from '@kerfmark/contracts';
import dayjs, { type Dayjs } from 'dayjs';
import { reactive } from 'vue';

/** The request form's state, in the units people type (caliper in points), and its conversion. */
export interface RequestForm {
  title: string;
  jobReference: string;
  quantity: number;
  ups: number;
  pieceWidthIn: number | undefined;
  pieceHeightIn: number | undefined;
  stockName: string;
  caliperPt: number | undefined;
  stockWeightGsm: number | undefined;
  grain: Grain | undefined;
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

export function emptyRequestForm(): RequestForm {
  return {
    title: '',
    jobReference: '',
    quantity: 1,
    ups: 1,
    pieceWidthIn: undefined,
    pieceHeightIn: undefined,
    stockName: '',
    caliperPt: undefined,
    stockWeightGsm: undefined,
    grain: undefined,
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
export function toRequestInput(form: RequestForm): DieRequestCreate {
  return {
    title: form.title,
    jobReference: blankToNull(form.jobReference),
    quantity: form.quantity,
    ups: form.ups,
    pieceWidthIn: form.pieceWidthIn ?? null,
    pieceHeightIn: form.pieceHeightIn ?? null,
    stockName: blankToNull(form.stockName),
    caliperIn: form.caliperPt ? Math.round(form.caliperPt * 10) / 10000 : null,
    stockWeightGsm: form.stockWeightGsm ?? null,
    grain: form.grain ?? null,
    ruleTypes: form.ruleTypes,
    counterWanted: form.counterWanted,
    ejectionRubberWanted: form.ejectionRubberWanted,
    pressId: form.pressId ?? null,
    runSheets: form.runSheets ?? null,
    plannedLeadDays: form.plannedLeadDays,
    needByDate: form.needByDate ? form.needByDate.format('YYYY-MM-DD') : null,
    bidDeadline: form.bidDeadline ? form.bidDeadline.toISOString() : null,
    deliveryAddress: blankToNull(form.deliveryAddress),
    deliveryPostcode: blankToNull(form.deliveryPostcode),
    visibility: form.visibility,
    invitedShopIds: form.visibility === 'invited' ? form.invitedShopIds : [],
    notes: blankToNull(form.notes),
  };
}

export function fromRequest(request: DieRequestDetail): RequestForm {
  return {
    title: request.title,
    jobReference: request.jobReference ?? '',
    quantity: request.quantity,
    ups: request.ups,
    pieceWidthIn: request.pieceWidthIn ?? undefined,
    pieceHeightIn: request.pieceHeightIn ?? undefined,
    stockName: request.stockName ?? '',
    caliperPt: request.caliperIn ? Math.round(request.caliperIn * 10000) / 10 : undefined,
    stockWeightGsm: request.stockWeightGsm ?? undefined,
    grain: request.grain ?? undefined,
    ruleTypes: request.ruleTypes,
    counterWanted: request.counterWanted,
    ejectionRubberWanted: request.ejectionRubberWanted,
    pressId: request.pressId ?? undefined,
    runSheets: request.runSheets ?? undefined,
    plannedLeadDays: request.plannedLeadDays,
    needByDate: request.needByDate ? dayjs(request.needByDate) : undefined,
    bidDeadline: request.bidDeadline ? dayjs(request.bidDeadline) : undefined,
    deliveryAddress: request.deliveryAddress ?? '',
    deliveryPostcode: request.deliveryPostcode ?? '',
    visibility: request.visibility,
    invitedShopIds: request.invitedShops.map((s) => s.id),
    notes: request.notes ?? '',
  };
}

export function useRequestDraft() {
  return reactive(emptyRequestForm());
}
