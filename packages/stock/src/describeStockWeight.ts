import { basisWeightToGsm, gsmToBasisWeight, MAX_STOCK_WEIGHT_GSM, type PaperGrade } from './basisWeight';
import { checkNumber } from './checkNumber';

/**
 * Stock weight in both systems, for a die request read on either side of the Atlantic:
 * `{ lb: 50, grade: 'cover' }` → "50 lb cover (135 g/m²)";
 * `{ gsm: 300, grade: 'cover' }` → "300 g/m² (about 111 lb cover)"; `{ gsm: 300 }` → "300 g/m²".
 */
export function describeStockWeight(
  stock: { lb: number; grade: PaperGrade } | { gsm: number; grade?: PaperGrade },
): string {
  if ('lb' in stock)
    return `${stock.lb} lb ${stock.grade} (${Math.round(basisWeightToGsm(stock.lb, stock.grade))} g/m²)`;
  if (stock.grade === undefined) {
    checkNumber('gsm', stock.gsm, { above: 0, atMost: MAX_STOCK_WEIGHT_GSM, unit: 'g/m²' });
    return `${stock.gsm} g/m²`;
  }
  return `${stock.gsm} g/m² (about ${Math.round(gsmToBasisWeight(stock.gsm, stock.grade))} lb ${stock.grade})`;
}
