export const STOCK_KINDS = ['paper', 'paperboard', 'corrugated'] as const;
export type StockKind = (typeof STOCK_KINDS)[number];

/** Returns the stock kind, or throws a RangeError naming the field when it is not one we know. */
export function checkStockKind(value: unknown, field = 'stockKind'): StockKind {
  if (!STOCK_KINDS.includes(value as StockKind)) {
    throw new RangeError(`${field} must be one of ${STOCK_KINDS.join(', ')} (got ${String(value)})`);
  }
  return value as StockKind;
}
