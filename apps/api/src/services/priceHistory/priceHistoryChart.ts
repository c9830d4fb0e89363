import { fairPriceBand, fitPrice, MODEL_CHOICE_RULE, pricePerInch, priceTrend } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { mainCurrency, priceObservations } from './priceObservations';
import { filteredRecords, type PriceFilters } from './priceRecordQuery';

const CHART_POINTS = 1500;

/** The fit, the band along rule length, price per inch by class and by quarter, and points to plot. */
export async function priceHistoryChart(knex: Knex, organisationId: number, f: PriceFilters) {
  const currency = f.currency ?? (await mainCurrency(knex, organisationId, f));
  if (!currency)
    return {
      currency: null,
      total: 0,
      sampled: 0,
      fit: { enough: false, reason: 'There are no price records for these filters yet.', needed: 8 },
      perInch: null,
      trend: null,
      curve: [],
      points: [],
      shops: [],
      rule: MODEL_CHOICE_RULE,
    };
  const { total, rows } = await priceObservations(knex, organisationId, f, currency);
  const obs = rows.map((r) => r.observation);
  const fit = fitPrice(obs);
  const features = obs.map((o) => o.features).sort((a, b) => a - b);
  const typicalFeatures = features[Math.floor(features.length / 2)] ?? 0;
  const lengths = obs.map((o) => o.ruleLengthIn);
  const [lo, hi] = [Math.min(...lengths), Math.max(...lengths)];
  const curve = fit.enough
    ? Array.from({ length: 25 }, (_, i) => lo + ((hi - lo) * i) / 24).map((ruleLengthIn) => ({
        ruleLengthIn,
        ...fairPriceBand(fit, { ruleLengthIn, features: typicalFeatures }),
      }))
    : [];
  const shops = await filteredRecords(knex, organisationId, {}).distinct('shopName').orderBy('shopName').limit(500);
  return {
    currency,
    total,
    sampled: obs.length,
    fit,
    perInch: pricePerInch(obs),
    trend: priceTrend(obs),
    curve,
    typicalFeatures,
    points: rows.slice(0, CHART_POINTS).map((r) => ({ ...r.observation, shopName: r.shopName })),
    shops: shops.map((r: { shopName: string }) => r.shopName),
    rule: MODEL_CHOICE_RULE,
  };
}
