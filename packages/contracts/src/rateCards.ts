import type { CalibratedRate, CardCalibration, Estimate } from '@kerfmark/pricing';
import { z } from 'zod';
import { Currency } from './bids';

/** A rate in whole minor units (cents for USD), per inch, per feature or per square inch. */
const Minor = (what: string) =>
  z
    .number({ error: `Enter ${what}` })
    .int(`${what[0]!.toUpperCase()}${what.slice(1)} is in whole cents (minor units)`)
    .min(0, 'A rate cannot be negative')
    .max(100_000_000, 'That rate is too large');

/** The rate card a die shop's admin saves, whole. */
export const RateCardInput = z
  .object({
    currency: Currency,
    rulePerInch: z.object({
      cut: Minor('the cutting rule rate'),
      crease: Minor('the creasing rule rate'),
      perf: Minor('the perforating rule rate'),
      kiss: Minor('the kiss-cut rule rate'),
    }),
    perBend: Minor('the rate per bend'),
    perJoint: Minor('the rate per joint'),
    perPunch: Minor('the rate per punch'),
    boardPerSqIn: z
      .array(
        z.object({
          thicknessIn: z
            .number({ error: 'Enter the board thickness' })
            .min(0.25, 'At least 0.25 in')
            .max(1.5, 'At most 1.5 in'),
          perSqIn: Minor('the board rate'),
        }),
      )
      .min(1, 'Give at least one board')
      .max(4, 'At most 4 boards')
      .refine((rows) => new Set(rows.map((r) => r.thicknessIn)).size === rows.length, {
        error: 'Each board thickness once',
      }),
    counterPerSqIn: Minor('the counter rate'),
    ejectionRubberPerSqIn: Minor('the ejection rubber rate'),
    setUp: Minor('the set-up charge'),
    minimumDie: Minor('the minimum die price'),
    rush: z
      .array(
        z.object({
          underDays: z.number().int('Whole working days').min(1, 'At least 1 day').max(60, 'At most 60 days'),
          factor: z.number().min(1, 'A rush factor is 1 or more').max(5, 'At most 5'),
        }),
      )
      .max(5, 'At most 5 rush bands')
      .refine((rows) => new Set(rows.map((r) => r.underDays)).size === rows.length, {
        error: 'Each lead time once',
      }),
  })
  .strict();
export type RateCardInput = z.infer<typeof RateCardInput>;

export interface RateCardDto extends RateCardInput {
  updatedAt: string;
  updatedByName: string | null;
}

export const EstimateQuery = z.object({
  leadDays: z.coerce.number().int('Whole working days').min(0).max(120),
  boardThicknessIn: z.coerce.number().min(0.25).max(1.5).optional(),
});

export type EstimateDto = Estimate & {
  /** The rule lengths and features priced: the whole die, stepped and repeated where the file is one up. */
  basis: { ruleIn: number; bends: number; joints: number; punches: number; boardSqIn: number; oneUp: boolean };
};

export type CalibrationDto = CardCalibration & { currency: string };
export type { CalibratedRate };
