import { median } from 'd3-array';
import { checkObservations, type PriceObservation } from './observations';

export interface QuarterPrice {
  /** Calendar quarter, e.g. '2026-Q3'. */
  quarter: string;
  /** Records priced in the quarter; 0 marks a quarter without data. */
  n: number;
  /** Median die price per inch of rule, whole cents; null for an empty quarter. */
  medianCentsPerInch: number | null;
  /** Percent change of the median from `comparedWith`; null for the first quarter with data and for empty ones. */
  changePct: number | null;
  /** The latest earlier quarter with data, the base of `changePct`. */
  comparedWith: string | null;
}

export interface PriceTrend {
  currency: string | null;
  /** Every calendar quarter from the first record's to the last one's, empty quarters included and marked n = 0. */
  quarters: QuarterPrice[];
}

const quarterIndex = (date: string) => Number(date.slice(0, 4)) * 4 + Math.floor((Number(date.slice(5, 7)) - 1) / 3);
const quarterName = (index: number) => `${Math.floor(index / 4)}-Q${(index % 4) + 1}`;

/**
 * How die prices move over time: per calendar quarter the median price per inch of rule and its
 * change from the latest earlier quarter with data (a gap is bridged, and named in
 * `comparedWith`). `complexity` keeps one class, so a shift between simple and complex dies is
 * not read as a price change. Throws on a bad record or mixed currencies.
 */
export function priceTrend(
  records: readonly PriceObservation[],
  opts: { complexity?: PriceObservation['complexity'] } = {},
): PriceTrend {
  const currency = checkObservations(records);
  const kept = opts.complexity ? records.filter((r) => r.complexity === opts.complexity) : records;
  const byQuarter = new Map<number, number[]>();
  for (const r of kept) {
    const q = quarterIndex(r.pricedOn);
    const list = byQuarter.get(q) ?? [];
    if (!list.length) byQuarter.set(q, list);
    list.push(r.dieCents / r.ruleLengthIn);
  }
  if (byQuarter.size === 0) return { currency, quarters: [] };

  const indices = [...byQuarter.keys()];
  const first = indices.reduce((a, b) => Math.min(a, b));
  const last = indices.reduce((a, b) => Math.max(a, b));
  const quarters: QuarterPrice[] = [];
  let previous: QuarterPrice | null = null;
  for (let q = first; q <= last; q++) {
    const perInch = byQuarter.get(q) ?? [];
    const medianCents = perInch.length ? Math.round(median(perInch)!) : null;
    // The change is of the whole-cent medians shown beside it, so the figures agree.
    const base = previous?.medianCentsPerInch;
    const row: QuarterPrice = {
      quarter: quarterName(q),
      n: perInch.length,
      medianCentsPerInch: medianCents,
      changePct: medianCents !== null && base ? ((medianCents - base) / base) * 100 : null,
      comparedWith: medianCents !== null && previous ? previous.quarter : null,
    };
    quarters.push(row);
    if (medianCents !== null) previous = row;
  }
  return { currency, quarters };
}
