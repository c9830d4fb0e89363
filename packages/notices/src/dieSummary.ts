import { formatLength, formatSize } from '@kerfmark/dieline';
import type { Reader } from './notifyOrganisation';

/** What a request's die measures, as its columns hold it (inches; null until measured). */
export interface DieFigures {
  ruleIn: string | number | null | undefined;
  boardWidthIn: string | number | null | undefined;
  boardHeightIn: string | number | null | undefined;
}

const num = (v: string | number | null | undefined) => (v === null || v === undefined || v === '' ? null : Number(v));

/**
 * One sentence on the die for an e-mail, in the reader's units: "The die has 412.5 in of rule
 * on a 22.00 × 30.00 in board." Empty until the dieline is measured.
 */
export function dieSummary(die: DieFigures, reader: Pick<Reader, 'lengthUnits' | 'locale'>): string {
  const rule = num(die.ruleIn);
  if (rule === null) return '';
  const style = { units: reader.lengthUnits, locale: reader.locale };
  const width = num(die.boardWidthIn);
  const height = num(die.boardHeightIn);
  const board = width && height ? ` on a ${formatSize(width, height, style)} board` : '';
  return `The die has ${formatLength(rule, style, 1)} of rule${board}.`;
}
