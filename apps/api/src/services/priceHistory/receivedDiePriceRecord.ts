import { pricedLength, type DielineMetrics } from '@kerfmark/contracts';

export interface AwardedDie {
  organisationId: number;
  requestId: number;
  awardId: number;
  shopId: number;
  shopName: string;
  totalCents: number;
  dieCents: number;
  currency: string;
  /** The award's date in the buyer's time zone, as YYYY-MM-DD. */
  pricedOn: string;
  metrics: DielineMetrics;
}

/** The price-history row a received die adds: its awarded price beside its dieline's metrics. */
export function receivedDiePriceRecord({ metrics, ...die }: AwardedDie) {
  return {
    ...die,
    ruleLengthIn: pricedLength(metrics.length),
    cutIn: metrics.length.cut,
    creaseIn: metrics.length.crease,
    perfIn: metrics.length.perf,
    kissIn: metrics.length.kiss,
    bends: metrics.bends,
    curves: metrics.curves,
    joints: metrics.joints,
    punches: metrics.punches,
    boardAreaSqIn: metrics.board.width * metrics.board.height,
    complexity: metrics.complexity,
  };
}
