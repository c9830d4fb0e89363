import { describe, expect, it } from 'vitest';
import { holidayPlaces } from './holidayPlaces';

describe('holidayPlaces', () => {
  it('lists the countries by name and the regions of the one asked for', () => {
    const places = holidayPlaces('US');
    expect(places.country).toBe('US');
    const names = places.countries.map((c) => c.name);
    expect([...names].sort((a, b) => a.localeCompare(b, 'en'))).toEqual(names);
    expect(places.countries).toContainEqual({ code: 'DE', name: 'Germany' });
    // The US has 50 states (from memory); the calendar adds DC and the territories.
    expect(places.regions.length).toBeGreaterThanOrEqual(50);
    expect(places.regions).toContainEqual({ code: 'IL', name: 'Illinois' });
  });

  it('gives no regions for a country whose public holidays are the same everywhere', () => {
    // From memory: Iceland's public holidays are national only.
    expect(holidayPlaces('IS').regions).toEqual([]);
  });

  it('refuses an unknown country', () => {
    expect(() => holidayPlaces('ZZ')).toThrow(expect.objectContaining({ status: 400 }));
  });
});
