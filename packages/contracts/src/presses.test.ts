import { describe, expect, it } from 'vitest';
import { PressCreate, PressUpdate, pressHoursPerDay } from './presses';

const press = {
  name: 'Platen 1',
  kind: 'platen',
  maxSheetWidthIn: 22,
  maxSheetLengthIn: 30,
  typicalSpeedSph: 4000,
  maxSpeedSph: 5000,
};

describe('press shifts', () => {
  it('defaults to one shift of 8 hours (common practice)', () => {
    const parsed = PressCreate.parse(press);
    expect(parsed).toMatchObject({ shiftsPerDay: 1, shiftHours: 8 });
    expect(pressHoursPerDay(parsed)).toBe(8);
  });

  it('refuses shifts that add up to more than a day', () => {
    expect(PressCreate.safeParse({ ...press, shiftsPerDay: 3, shiftHours: 8 }).success).toBe(true);
    const over = PressCreate.safeParse({ ...press, shiftsPerDay: 3, shiftHours: 10 });
    expect(over.success).toBe(false);
    expect(over.error?.issues[0]).toMatchObject({ path: ['shiftHours'] });
    expect(PressUpdate.safeParse({ shiftsPerDay: 2, shiftHours: 12.5 }).success).toBe(false);
  });

  it('changes nothing unnamed on an update: no default under the partial schema', () => {
    expect(PressUpdate.parse({ name: 'Platen 2' })).toEqual({ name: 'Platen 2' });
  });
});
