/** Mean Earth radius in statute miles (IUGG mean radius 6,371.0088 km ÷ 1.609344 km per mile). */
export const EARTH_RADIUS_MILES = 6371.0088 / 1.609344;

export interface LatLon {
  lat: number;
  lon: number;
}

/** Great-circle distance by the haversine formula, in miles. */
export function distanceMiles(a: LatLon, b: LatLon): number {
  const rad = Math.PI / 180;
  const dLat = (b.lat - a.lat) * rad;
  const dLon = (b.lon - a.lon) * rad;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(a.lat * rad) * Math.cos(b.lat * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_MILES * Math.asin(Math.min(1, Math.sqrt(h)));
}
