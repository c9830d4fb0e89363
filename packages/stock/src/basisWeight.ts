import { checkNumber } from './checkNumber';
import { MM_PER_INCH } from './caliper';

/**
 * North American paper grades by basis size. Book and offset share text's size; writing
 * shares bond's.
 */
export type PaperGrade = 'text' | 'cover' | 'bristol' | 'index' | 'bond';

/** Basis sheet size in inches: the basis weight is what 500 of these sheets weigh, in pounds. */
export const BASIS_SIZES_IN: Readonly<Record<PaperGrade, readonly [number, number]>> = {
  text: [25, 38],
  cover: [20, 26],
  bristol: [22.5, 28.5],
  index: [25.5, 30.5],
  bond: [17, 22],
};

/** The international pound (1959): exactly 453.59237 g. */
export const GRAMS_PER_POUND = 453.59237;

/** Past any stock sold by weight (the heaviest grey boards are a few thousand g/m²); a sanity limit of our own. */
export const MAX_STOCK_WEIGHT_GSM = 5000;

const SHEETS_PER_REAM = 500;
const SQUARE_METRES_PER_SQUARE_INCH = (MM_PER_INCH / 1000) ** 2;

/** Grams per square metre of one pound basis weight in the grade, from its basis size. */
function gsmPerPound(grade: PaperGrade): number {
  if (!Object.hasOwn(BASIS_SIZES_IN, grade)) {
    throw new RangeError(`grade must be one of ${Object.keys(BASIS_SIZES_IN).join(', ')} (got ${String(grade)})`);
  }
  const [width, length] = BASIS_SIZES_IN[grade];
  return GRAMS_PER_POUND / SHEETS_PER_REAM / (width * length * SQUARE_METRES_PER_SQUARE_INCH);
}

/** Basis weight in pounds (e.g. 50 lb cover) to grams per square metre. */
export function basisWeightToGsm(lb: number, grade: PaperGrade): number {
  const perPound = gsmPerPound(grade);
  // The limit in whole pounds of this grade, so the message reads plainly.
  checkNumber('lb', lb, { above: 0, atMost: Math.floor(MAX_STOCK_WEIGHT_GSM / perPound), unit: `lb ${grade}` });
  return lb * perPound;
}

/** Grams per square metre to basis weight in pounds of the grade. */
export function gsmToBasisWeight(gsm: number, grade: PaperGrade): number {
  const perPound = gsmPerPound(grade);
  checkNumber('gsm', gsm, { above: 0, atMost: MAX_STOCK_WEIGHT_GSM, unit: 'g/m²' });
  return gsm / perPound;
}
