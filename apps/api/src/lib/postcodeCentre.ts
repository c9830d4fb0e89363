import zipcodes from 'zipcodes';
import type { LatLon } from './distanceMiles';

// Postcode centres from the zipcodes package's dataset: US ZIP codes, and Canadian postal codes
// by their forward sortation area (the first three characters), as published with it. A
// postcode it does not hold has no centre, so no distance is shown rather than a wrong one.

const US_ZIP = /^(\d{5})(?:-?\d{4})?$/;
const CANADIAN =
  /^([A-CEGHJ-NPR-TVXY]\d[A-CEGHJ-NPR-TV-Z])\s?\d[A-CEGHJ-NPR-TV-Z]\d$|^([A-CEGHJ-NPR-TVXY]\d[A-CEGHJ-NPR-TV-Z])$/;

/** The dataset's key for a postcode as people type it, or null when it is neither form. */
export function postcodeKey(postcode: string | null | undefined): string | null {
  const p = postcode?.trim().toUpperCase() ?? '';
  const us = US_ZIP.exec(p);
  if (us) return us[1]!;
  const ca = CANADIAN.exec(p);
  return ca ? (ca[1] ?? ca[2])! : null;
}

/** The centre of a postcode the dataset holds, or null. */
export function postcodeCentre(postcode: string | null | undefined): LatLon | null {
  const key = postcodeKey(postcode);
  const found = key ? zipcodes.lookup(key) : undefined;
  return found ? { lat: found.latitude, lon: found.longitude } : null;
}
