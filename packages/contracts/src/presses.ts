import { inchesAndMm } from '@kerfmark/dieline';
import { CUTTING_RULE_HEIGHT_IN, CUTTING_RULE_HEIGHTS_IN } from '@kerfmark/stock';
import { z } from 'zod';

export const pressKinds = ['platen', 'flatbed', 'rotary'] as const;
export const PressKind = z.enum(pressKinds);
export type PressKind = z.infer<typeof PressKind>;

export const pressKindLabels: Record<PressKind, string> = {
  platen: 'Platen',
  flatbed: 'Flatbed',
  rotary: 'Rotary',
};

const SheetSide = z
  .number({ error: 'Enter a size' })
  // Stored to the hundredth of an inch: a side under 1 in is no press, and 1e-300 would be stored as 0.
  .min(1, `A sheet side is at least ${inchesAndMm(1)}`)
  .max(120, `A sheet side is at most ${inchesAndMm(120)}`);

// Common practice: die-cutting presses run a few thousand sheets an hour, up to about 7,800 on a
// fast one; the upper bound here is generous so that rotary lines fit too.
const Speed = z
  .number({ error: 'Enter a speed in sheets an hour' })
  .int('Enter a whole number of sheets an hour')
  .positive('A speed must be more than 0')
  .max(50_000, 'A speed is at most 50,000 sheets an hour');

// Common practice: one, two or three shifts a day; 8 hours is the usual shift.
const ShiftsPerDay = z
  .number({ error: 'Enter the shifts a day' })
  .int('Whole shifts')
  .min(1, 'At least 1 shift a day')
  .max(3, 'At most 3 shifts a day');
const ShiftHours = z
  .number({ error: 'Enter the hours of a shift' })
  .min(1, 'A shift is at least 1 hour')
  .max(12, 'A shift is at most 12 hours')
  .multipleOf(0.25, 'Enter hours in quarters');

const CuttingRuleHeight = z.union(
  CUTTING_RULE_HEIGHTS_IN.map((h) => z.literal(h)),
  { error: `Choose a cutting rule height: ${CUTTING_RULE_HEIGHTS_IN.join(' in or ')} in` },
);

const PressFields = z.object({
  name: z.string({ error: 'Enter a name' }).trim().min(1, 'Enter a name').max(120, 'A name has at most 120 characters'),
  kind: PressKind,
  maxSheetWidthIn: SheetSide,
  maxSheetLengthIn: SheetSide,
  typicalSpeedSph: Speed,
  maxSpeedSph: Speed,
  shiftsPerDay: ShiftsPerDay,
  shiftHours: ShiftHours,
  /** The cutting rule height the press's dies are made to; creasing rule height follows from it. */
  cuttingRuleHeightIn: CuttingRuleHeight,
  active: z.boolean({ error: 'Choose whether the press is in use' }),
});

const speedOrder = (v: { typicalSpeedSph?: number; maxSpeedSph?: number }) =>
  v.typicalSpeedSph === undefined || v.maxSpeedSph === undefined || v.typicalSpeedSph <= v.maxSpeedSph;
const speedOrderIssue = { error: 'The typical speed cannot be above the maximum speed', path: ['typicalSpeedSph'] };
const dayFits = (v: { shiftsPerDay?: number; shiftHours?: number }) =>
  v.shiftsPerDay === undefined || v.shiftHours === undefined || v.shiftsPerDay * v.shiftHours <= 24;
const dayFitsIssue = { error: 'The shifts add up to more than 24 hours a day', path: ['shiftHours'] };

/** Hours the press runs in a working day: its shifts times their length. */
export const pressHoursPerDay = (press: { shiftsPerDay: number; shiftHours: number }) =>
  press.shiftsPerDay * press.shiftHours;

export const PressCreate = PressFields.extend({
  active: PressFields.shape.active.default(true),
  shiftsPerDay: ShiftsPerDay.default(1),
  shiftHours: ShiftHours.default(8),
  cuttingRuleHeightIn: CuttingRuleHeight.default(CUTTING_RULE_HEIGHT_IN),
})
  .refine(speedOrder, speedOrderIssue)
  .refine(dayFits, dayFitsIssue);
export type PressCreate = z.infer<typeof PressCreate>;

export const PressUpdate = PressFields.partial()
  .refine((v) => Object.keys(v).length > 0, { error: 'Nothing to change' })
  .refine(speedOrder, speedOrderIssue)
  .refine(dayFits, dayFitsIssue);
export type PressUpdate = z.infer<typeof PressUpdate>;

export const Press = PressFields.extend({
  id: z.number().int(),
  createdAt: z.string(),
});
export type Press = z.infer<typeof Press>;
