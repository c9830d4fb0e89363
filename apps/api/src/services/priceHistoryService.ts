import type { DielineMetrics } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { notFound } from '../lib/httpError';
import { DieRequest } from '../models';
import type { ServiceDeps } from './deps';
import { fairPriceFor } from './priceHistory/fairPriceFor';
import { createHistoryFits } from './priceHistory/historyFits';
import { importPriceRecords } from './priceHistory/importPriceRecords';
import { priceHistoryChart } from './priceHistory/priceHistoryChart';
import { readingStyle } from '../lib/readingStyle';
import { priceHistoryCsv } from './priceHistory/priceHistoryCsv';
import { previewImport } from './priceHistory/priceImport';
import { priceRecordPage } from './priceHistory/priceRecordPage';
import type { PriceFilters } from './priceHistory/priceRecordQuery';
import { primaryFile } from '../dto/requestViews';

/** The printer's own price history: records, the fit, fair-price bands and the CSV import and export. */
export function createPriceHistoryService({ knex }: ServiceDeps) {
  const fits = createHistoryFits(knex);
  const bandFor = (organisationId: number, metrics: DielineMetrics | null | undefined, currency: string) =>
    fairPriceFor(fits, organisationId, metrics, currency);
  return {
    forget: fits.forget,
    fit: (actor: AuthUser, f: PriceFilters) => priceHistoryChart(knex, actor.organisationId, f),
    /** The fair-price band for a request's die, from the printer's own history, or why there is none. */
    async fairPrice(actor: AuthUser, requestId: number, currency = 'USD') {
      const request = await DieRequest.query()
        .findOne({ id: requestId, organisationId: actor.organisationId })
        .withGraphFetched('files(byUpload)');
      if (!request) throw notFound('That die request');
      return bandFor(actor.organisationId, primaryFile(request.files)?.metrics, currency);
    },
    fairPriceFor: bandFor,
    list: (actor: AuthUser, f: PriceFilters) => priceRecordPage(knex, actor.organisationId, f),
    /** The filtered history as CSV, lengths in the reader's units. */
    csv: async (actor: AuthUser, f: PriceFilters) =>
      priceHistoryCsv(knex, actor.organisationId, f, (await readingStyle(knex, actor.id)).lengthUnits),
    preview: (text: string) => previewImport(text),
    async importCsv(actor: AuthUser, text: string, mapping: Record<string, string>) {
      const result = await importPriceRecords(knex, actor, text, mapping);
      fits.forget(actor.organisationId);
      return result;
    },
  };
}
