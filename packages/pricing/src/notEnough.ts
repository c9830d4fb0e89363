/**
 * The answer of a statistic that has too little data, or data too uniform, to say anything:
 * it says why and how many records it needs instead of guessing.
 */
export interface NotEnough {
  enough: false;
  reason: string;
  /** The least number of records (of enough variety) the statistic needs. */
  needed: number;
}
