import { describe, expect, it } from 'vitest';
import { distanceMiles, EARTH_RADIUS_MILES } from './distanceMiles';
import { postcodeCentre } from './postcodeCentre';

describe('distanceMiles', () => {
  // Geometry: from the equator to a pole is a quarter of a great circle, π/2 × R.
  it('measures a quarter great circle', () => {
    expect(distanceMiles({ lat: 0, lon: 0 }, { lat: 90, lon: 0 })).toBeCloseTo((Math.PI / 2) * EARTH_RADIUS_MILES, 6);
    expect(distanceMiles({ lat: 41.9, lon: -87.6 }, { lat: 41.9, lon: -87.6 })).toBe(0);
  });

  // From memory: Chicago to Indianapolis is about 165 miles as the crow flies.
  it('puts Chicago about 165 miles from Indianapolis', () => {
    const miles = distanceMiles(postcodeCentre('60614')!, postcodeCentre('46204')!);
    expect(miles).toBeGreaterThan(150);
    expect(miles).toBeLessThan(180);
  });
});
