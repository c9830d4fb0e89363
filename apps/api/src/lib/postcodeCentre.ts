import type { LatLon } from './distanceMiles';

// Approximate centres of the US ZIP codes the demo scenario uses (from memory, to about 0.05°).
// Enough to show a die shop how far a die travels; production would use a geocoding service.
const CENTRES: Record<string, LatLon> = {
  '60614': { lat: 41.922, lon: -87.651 }, // Chicago, Lincoln Park
  '60148': { lat: 41.874, lon: -88.016 }, // Lombard, Illinois
  '46204': { lat: 39.771, lon: -86.157 }, // Indianapolis, downtown
  '53202': { lat: 43.046, lon: -87.899 }, // Milwaukee, downtown
  '23510': { lat: 36.853, lon: -76.288 }, // Norfolk, Virginia
};

/** The centre of a postcode we know, or null. */
export function postcodeCentre(postcode: string | null | undefined): LatLon | null {
  return postcode ? (CENTRES[postcode.trim().slice(0, 5)] ?? null) : null;
}

/** Every postcode with a known centre, for working out distances to all of them at once. */
export function knownPostcodes(): Array<{ postcode: string; centre: LatLon }> {
  return Object.entries(CENTRES).map(([postcode, centre]) => ({ postcode, centre }));
}
