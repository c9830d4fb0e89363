import { z } from 'zod';
import { calendarDate } from './dateFields';
import type { DielineMetrics } from './requestDtos';
import type { RuleType } from './requests';

export const dieConditions = ['good', 'worn', 'damaged', 'retired'] as const;

export const LibraryDieUpdate = z
  .object({
    name: z.string().trim().min(1, 'Enter a name').max(160).optional(),
    storageLocation: z.string().trim().max(120).nullable().optional(),
    condition: z.enum(dieConditions).optional(),
    impressionLimit: z.number().int().min(1).max(100_000_000).nullable().optional(),
    listed: z.boolean().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { error: 'Nothing to change' });

export const DieRunInput = z.object({
  runOn: calendarDate('Enter the date of the run'),
  impressions: z
    .number({ error: 'Enter the impressions run' })
    .int('Whole impressions')
    .min(1, 'At least 1')
    .max(10_000_000, 'At most 10,000,000 in one run'),
  jobReference: z.string().trim().max(60).nullable().optional(),
  notes: z.string().trim().max(1000).nullable().optional(),
});

export interface DieRunDto {
  id: number;
  runOn: string;
  impressions: number;
  jobReference: string | null;
  notes: string | null;
}

export interface LibraryDieDto {
  id: number;
  name: string;
  ownerName: string;
  mine: boolean;
  requestId: number | null;
  pieceWidthIn: number | null;
  pieceHeightIn: number | null;
  ups: number;
  ruleTypes: RuleType[];
  pressName: string | null;
  storageLocation: string | null;
  condition: (typeof dieConditions)[number];
  impressions: number;
  impressionLimit: number | null;
  /** Within 10 % of its impression limit (or past it). */
  nearEndOfLife: boolean;
  lastUsedOn: string | null;
  listed: boolean;
  metrics: DielineMetrics | null;
  runs?: DieRunDto[];
  match?: { score: number; reasons: string[] };
}
