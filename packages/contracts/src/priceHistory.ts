import type { Complexity } from '@kerfmark/dieline';
import { z } from 'zod';
import { calendarDate } from './dateFields';

const IsoDate = calendarDate();

export const PriceHistoryQuery = z.object({
  from: IsoDate.optional(),
  to: IsoDate.optional(),
  complexity: z.enum(['simple', 'complex']).optional(),
  ruleType: z.enum(['cut', 'crease', 'perf', 'kiss']).optional(),
  shop: z.string().trim().min(1).max(200).optional(),
  minIn: z.coerce.number().min(0).max(100_000).optional(),
  maxIn: z.coerce.number().min(0).max(100_000).optional(),
  currency: z.string().length(3).toUpperCase().optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type PriceHistoryQuery = z.input<typeof PriceHistoryQuery>;

export interface PriceRecordDto {
  id: number;
  pricedOn: string;
  shopName: string;
  requestId: number | null;
  totalCents: number;
  dieCents: number;
  currency: string;
  ruleLengthIn: number;
  cutIn: number;
  creaseIn: number;
  perfIn: number;
  kissIn: number;
  bends: number;
  curves: number;
  joints: number;
  punches: number;
  boardAreaSqIn: number;
  complexity: Complexity;
  source: 'award' | 'import';
}

/** The columns a price-history CSV can fill, with the words we look for in its headers. */
export const importFields = {
  pricedOn: { label: 'Date', required: true, hints: ['date', 'priced', 'awarded', 'ordered'] },
  shopName: { label: 'Die shop', required: true, hints: ['shop', 'supplier', 'vendor', 'maker'] },
  diePrice: { label: 'Die price', required: true, hints: ['die price', 'die', 'price'] },
  totalPrice: { label: 'Total price', required: false, hints: ['total'] },
  currency: { label: 'Currency', required: false, hints: ['currency', 'ccy'] },
  ruleLengthIn: { label: 'Rule length (in or mm)', required: true, hints: ['rule length', 'length', 'inches', 'rule'] },
  bends: { label: 'Bends', required: false, hints: ['bends', 'bend'] },
  curves: { label: 'Curves', required: false, hints: ['curves', 'curve', 'arcs'] },
  joints: { label: 'Joints', required: false, hints: ['joints', 'joint', 'notches'] },
  punches: { label: 'Punches', required: false, hints: ['punches', 'punch', 'holes'] },
  complexity: { label: 'Complexity', required: false, hints: ['complexity', 'class'] },
} as const;
export type ImportField = keyof typeof importFields;

/** The unit a rule-length column's heading names: "Rule length (mm)" is millimetres, anything else inches. */
export function unitOfHeading(heading: string): 'in' | 'mm' {
  return /\bmm\b|millimet/i.test(heading) ? 'mm' : 'in';
}

export const ImportMapping = z.record(z.string(), z.string().max(200));

export interface ImportPreviewDto {
  headers: string[];
  rows: string[][];
  totalRows: number;
  suggested: Partial<Record<ImportField, string>>;
}

export interface ImportRowError {
  row: number;
  field: string;
  message: string;
}
