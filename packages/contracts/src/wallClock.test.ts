import { describe, expect, it } from 'vitest';
import { instantOfWallClock, wallClockIn } from './wallClock';

describe('wall clocks in a zone', () => {
  // Europe/Berlin is UTC+1 in winter and UTC+2 from the last Sunday of March (EU Directive
  // 2000/84/EC); America/Chicago UTC−6 and UTC−5 from the second Sunday of March (Energy Policy Act of 2005).
  it('reads an instant as the zone’s wall clock', () => {
    expect(wallClockIn('2026-12-10T16:00:00Z', 'Europe/Berlin')).toBe('2026-12-10T17:00:00');
    expect(wallClockIn(new Date('2026-12-10T16:00:00Z'), 'America/Chicago')).toBe('2026-12-10T10:00:00');
  });

  it('turns a wall clock back into the instant, either side of a change of clocks', () => {
    expect(instantOfWallClock('2026-03-28T17:00', 'Europe/Berlin').toISOString()).toBe('2026-03-28T16:00:00.000Z');
    expect(instantOfWallClock('2026-03-29T17:00', 'Europe/Berlin').toISOString()).toBe('2026-03-29T15:00:00.000Z');
    expect(instantOfWallClock('2026-03-08T09:00:00', 'America/Chicago').toISOString()).toBe('2026-03-08T14:00:00.000Z');
  });

  it('goes round the trip', () => {
    const wall = wallClockIn('2026-10-25T09:30:00Z', 'Europe/London');
    expect(instantOfWallClock(wall, 'Europe/London').toISOString()).toBe('2026-10-25T09:30:00.000Z');
  });
});
