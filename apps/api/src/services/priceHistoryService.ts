import { featureCount } from '@kerfmark/dieline';
import type { ImportRowError, Page, PriceRecordDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { HttpError } from '../lib/httpError';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';
import { previewImport, readImport } from './priceImport';
import { priceHistoryCsv } from './priceHistoryCsv';
import { filteredRecords, toPriceRecordDto, type PriceFilters as Filters } from './priceRecordQuery';
import {
  fairPriceBand,
  fitPrice,
  MODEL_CHOICE_RULE,
  pricePerInch,
  priceTrend,
  type PriceObservation,
} from '@kerfmark/pricing';
import { pricedLength, type DielineMetrics } from '@kerfmark/contracts';
import { DieRequest } from '../models';
import { notFound } from '../lib/httpError';
import { primaryFile } from './requestViews';

/** The fit works on at most this many records (a pseudo-random sample past it): enough for stable estimates. */
export const FIT_SAMPLE = 5000;
const CHART_POINTS = 1500;

/** Fits are kept this long per organisation and currency: the history changes slowly. */
const FIT_CACHE_MS = 5 * 60_000;

export function createPriceHistoryService({ knex }: ServiceDeps) {
  // The unfiltered fit behind every fair-price band, cached so that a bid comparison does not
  // refit the whole history; an import or a received die clears the organisation's entries.
  // The promise is what is kept, so that many comparisons arriving together share one fit.
  const fits = new Map<string, { at: number; fit: Promise<ReturnType<typeof fitPrice>> }>();
  function historyFit(organisationId: number, currency: string) {
    const key = `${organisationId}:${currency}`;
    const hit = fits.get(key);
    if (hit && Date.now() - hit.at < FIT_CACHE_MS) return hit.fit;
    const fit = observations(organisationId, {}, currency).then(({ rows }) => fitPrice(rows.map((r) => r.observation)));
    fits.set(key, { at: Date.now(), fit });
    // A failed fit (the database was down, say) is not kept.
    fit.catch(() => fits.get(key)?.fit === fit && fits.delete(key));
    return fit;
  }
  const forget = (organisationId: number) => {
    for (const key of fits.keys()) if (key.startsWith(`${organisationId}:`)) fits.delete(key);
  };

  /** The currency most of the filtered records are in, when the filters name none. */
  async function mainCurrency(organisationId: number, f: Partial<Filters>): Promise<string | null> {
    const row = await filteredRecords(knex, organisationId, f)
      .groupBy('currency')
      .select('currency')
      .count('* as n')
      .orderBy('n', 'desc')
      .first();
    return (row?.currency as string | undefined) ?? null;
  }

  async function observations(organisationId: number, f: Partial<Filters>, currency: string) {
    const [{ count }] = await filteredRecords(knex, organisationId, { ...f, currency }).count('* as count');
    const q = filteredRecords(knex, organisationId, { ...f, currency }).select(
      'dieCents',
      'currency',
      'ruleLengthIn',
      'bends',
      'curves',
      'joints',
      'punches',
      'complexity',
      'pricedOn',
      'shopName',
    );
    // A sample in a fixed pseudo-random order (by a hash of the id), not random(): every API
    // instance, and every refit, then shows the same band for the same history.
    if (Number(count) > FIT_SAMPLE) q.orderByRaw('hashint8(price_records.id)').limit(FIT_SAMPLE);
    const rows = (await q) as Array<Record<string, unknown>>;
    return {
      total: Number(count),
      rows: rows.map((r) => ({
        observation: {
          dieCents: Number(r.dieCents),
          currency: String(r.currency),
          ruleLengthIn: Number(r.ruleLengthIn),
          features: Number(r.bends) + Number(r.curves) + Number(r.joints) + Number(r.punches),
          complexity: r.complexity as 'simple' | 'complex',
          pricedOn: String(r.pricedOn),
        } satisfies PriceObservation,
        shopName: String(r.shopName),
      })),
    };
  }

  /** The band for a die of these metrics, from the organisation's history, or why there is none. */
  async function fairPriceFor(organisationId: number, metrics: DielineMetrics | null | undefined, currency: string) {
    if (!metrics) return { enough: false as const, reason: 'The request has no measured dieline yet.', needed: 0 };
    const fit = await historyFit(organisationId, currency);
    if (!fit.enough) return fit;
    const die = {
      ruleLengthIn: pricedLength(metrics.length),
      features: featureCount(metrics),
    };
    if (!(die.ruleLengthIn > 0))
      return { enough: false as const, reason: 'The dieline has no priced rule to price.', needed: 0 };
    return {
      enough: true as const,
      band: fairPriceBand(fit, die),
      die,
      model: fit.model,
      n: fit.n,
      describe: fit.describe,
    };
  }

  return {
    /** Drops the cached fits of an organisation whose history just changed. */
    forget,

    /** The fit, the band along rule length, price per inch by class and by quarter, and points to plot. */
    async fit(actor: AuthUser, f: Filters) {
      const currency = f.currency ?? (await mainCurrency(actor.organisationId, f));
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
      const { total, rows } = await observations(actor.organisationId, f, currency);
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
        shops: (
          await filteredRecords(knex, actor.organisationId, {}).distinct('shopName').orderBy('shopName').limit(500)
        ).map((r: { shopName: string }) => r.shopName),
        rule: MODEL_CHOICE_RULE,
      };
    },

    /** The fair-price band for a request's die, from the printer's own history, or why there is none. */
    async fairPrice(actor: AuthUser, requestId: number, currency = 'USD') {
      const request = await DieRequest.query()
        .findOne({ id: requestId, organisationId: actor.organisationId })
        .withGraphFetched('files(byUpload)');
      if (!request) throw notFound('That die request');
      return fairPriceFor(actor.organisationId, primaryFile(request.files)?.metrics, currency);
    },

    fairPriceFor,

    async list(actor: AuthUser, f: Filters): Promise<Page<PriceRecordDto>> {
      const [rows, [{ count }]] = await Promise.all([
        filteredRecords(knex, actor.organisationId, f)
          .orderBy([
            { column: 'pricedOn', order: 'desc' },
            { column: 'id', order: 'desc' },
          ])
          .limit(f.pageSize)
          .offset((f.page - 1) * f.pageSize),
        filteredRecords(knex, actor.organisationId, f).count('* as count'),
      ]);
      return {
        items: (rows as Array<Record<string, unknown>>).map(toPriceRecordDto),
        total: Number(count),
        page: f.page,
        pageSize: f.pageSize,
      };
    },

    /** The filtered history as CSV, money in major units (as people read it), dates as YYYY-MM-DD. */
    csv: (actor: AuthUser, f: Filters) => priceHistoryCsv(knex, actor.organisationId, f),

    preview: (text: string) => previewImport(text),

    /** Imports every row or none: a single bad row stops the whole file, with each error listed. */
    async importCsv(actor: AuthUser, text: string, mapping: Record<string, string>): Promise<{ imported: number }> {
      const { records, errors } = readImport(text, mapping, 'USD');
      if (errors.length) {
        throw new HttpError(
          400,
          'import_rejected',
          `${errors.length} problem${errors.length === 1 ? '' : 's'} found; nothing was imported. Fix the rows and try again.`,
          undefined,
          undefined,
          {
            rows: errors.slice(0, 500) satisfies ImportRowError[],
          },
        );
      }
      await knex.transaction(async (trx) => {
        for (let i = 0; i < records.length; i += 1000) {
          await trx('priceRecords').insert(
            records.slice(i, i + 1000).map((r) => ({
              organisationId: actor.organisationId,
              shopName: r.shopName,
              totalCents: r.totalCents,
              dieCents: r.dieCents,
              currency: r.currency,
              pricedOn: r.pricedOn,
              ruleLengthIn: r.ruleLengthIn,
              bends: r.bends,
              curves: r.curves,
              joints: r.joints,
              punches: r.punches,
              complexity: r.complexity,
              source: 'import',
            })),
          );
        }
        await recordAudit(trx, {
          organisationId: actor.organisationId,
          actorUserId: actor.id,
          entity: 'price_history',
          entityId: actor.organisationId,
          action: 'imported',
          detail: { rows: records.length },
        });
      });
      forget(actor.organisationId);
      return { imported: records.length };
    },
  };
}
