/** International inch (1959; ISO 80000-3): exactly 25.4 mm. */
export const MM_PER_INCH = 25.4;

export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

/**
 * Inches per drawing unit for the DXF header variable $INSUNITS, for the codes a dieline uses.
 * 0 (unitless) is not here: the caller asks the user and defaults to inches.
 */
export const inchesPerInsunit: Readonly<Record<number, number>> = {
  1: 1, // inches
  2: 12, // feet
  4: 1 / MM_PER_INCH, // millimetres
  5: 10 / MM_PER_INCH, // centimetres
  6: 1000 / MM_PER_INCH, // metres
};
