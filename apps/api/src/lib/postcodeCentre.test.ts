import { describe, expect, it } from 'vitest';
import { distanceMiles } from './distanceMiles';
import { postcodeCentre, postcodeKey } from './postcodeCentre';

describe('postcode centres', () => {
  it('reads US ZIP codes, with or without the +4, and Canadian postal codes by their area', () => {
    expect(postcodeKey(' 60614-1234 ')).toBe('60614');
    expect(postcodeKey('m5v 3l9')).toBe('M5V');
    expect(postcodeKey('M5V3L9')).toBe('M5V');
    expect(postcodeKey('SW1A 1AA')).toBeNull(); // a UK postcode: not in the dataset's forms
    expect(postcodeKey('D5V 3L9')).toBeNull(); // Canadian codes never start with D (Canada Post)
  });

  // From memory: Lincoln Park, Chicago lies near 41.92° N, 87.65° W; downtown Toronto near
  // 43.65° N, 79.38° W.
  it('places known postcodes near where they are', () => {
    const chicago = postcodeCentre('60614')!;
    expect(chicago.lat).toBeCloseTo(41.92, 1);
    expect(chicago.lon).toBeCloseTo(-87.65, 1);
    const toronto = postcodeCentre('M5V 3L9')!;
    expect(toronto.lat).toBeCloseTo(43.65, 1);
    expect(toronto.lon).toBeCloseTo(-79.38, 1);
  });

  it('gives no centre, never a wrong one, for a postcode it does not hold', () => {
    expect(postcodeCentre('00000')).toBeNull();
    expect(postcodeCentre('SW1A 1AA')).toBeNull();
    expect(postcodeCentre('')).toBeNull();
    expect(postcodeCentre(null)).toBeNull();
  });

  // From memory: Chicago to Toronto is about 430 miles as the crow flies.
  it('puts Chicago about 430 miles from Toronto', () => {
    const miles = distanceMiles(postcodeCentre('60614')!, postcodeCentre('M5V')!);
    expect(miles).toBeGreaterThan(410);
    expect(miles).toBeLessThan(450);
  });
});
