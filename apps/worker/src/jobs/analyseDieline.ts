import { analyseDielineAsync, DielineError, type LayerMap, type UpsLayout } from '@kerfmark/dieline';
import type { Storage } from '@kerfmark/storage';
import type { Knex } from 'knex';

const UNREADABLE =
  'Kerfmark could not measure this file. Save it again from your drawing program as DXF, SVG or PDF and upload it again.';

/** `superseded`: the layers were remapped during the run, so its figures are dropped for the new run's. */
export type AnalysisResult = 'done' | 'failed' | 'skipped' | 'superseded';

/** A run that has not finished after this long is taken to have died with its worker. */
export const STALE_ANALYSIS_MS = 10 * 60_000;

/** A run that started before `staleMs` ago (or before runs recorded their start) and never finished. */
function staleRun(q: Knex.QueryBuilder, staleMs: number): Knex.QueryBuilder {
  return q
    .where('analysis_status', 'analysing')
    .andWhere((t) =>
      t.whereNull('analysis_started_at').orWhere('analysis_started_at', '<', new Date(Date.now() - staleMs)),
    );
}

interface ClaimedFile {
  id: number;
  request_id: number;
  file_name: string;
  s3_key: string;
  layer_map: LayerMap | null;
  pdf_page: number | null;
  analysis_runs: number;
}

/** The whole die to lay out when the request's dieline is one up. */
function layoutOf(request: Record<string, unknown> | undefined): UpsLayout | null {
  if (request?.dieline_shows !== 'one-up' || !request.ups_across || !request.ups_along) return null;
  return {
    across: Number(request.ups_across),
    along: Number(request.ups_along),
    gutterIn: Number(request.gutter_in ?? 0),
    pieceGrain: (request.piece_grain as UpsLayout['pieceGrain']) ?? 'either',
    sheetGrain: (request.grain as UpsLayout['sheetGrain']) ?? null,
  };
}

/**
 * Claims a file for one run, in one conditional update: only a waiting file, or one whose run
 * went stale, is claimed, so of two workers that reach the same file (its job in one, the sweep
 * in the other) one measures it and the other skips it.
 */
async function claim(knex: Knex, fileId: number, staleMs: number): Promise<ClaimedFile | undefined> {
  const [row] = await knex('dieline_files')
    .where({ id: fileId })
    .andWhere((q) => q.where('analysis_status', 'pending').orWhere((s) => staleRun(s, staleMs)))
    .update({
      analysis_status: 'analysing',
      analysis_started_at: new Date(),
      analysis_runs: knex.raw('analysis_runs + 1'),
    })
    .returning(['id', 'request_id', 'file_name', 's3_key', 'layer_map', 'pdf_page', 'analysis_runs']);
  return row as ClaimedFile | undefined;
}

/**
 * Measures one uploaded dieline and stores its metrics and preview. A file that cannot be read
 * keeps its upload and gets the reason; a store or database that is down throws, so the queue
 * retries (and the sweep after that). Every write after the claim names the run it belongs to:
 * a remap during the run (which makes the file wait again) wins over the run's stale figures.
 */
export async function analyseDielineFile(
  knex: Knex,
  storage: Storage,
  fileId: number,
  opts: { staleMs?: number } = {},
): Promise<AnalysisResult> {
  const file = await claim(knex, fileId, opts.staleMs ?? STALE_ANALYSIS_MS);
  if (!file) return 'skipped';
  const thisRun = () =>
    knex('dieline_files').where({ id: fileId, analysis_status: 'analysing', analysis_runs: file.analysis_runs });
  const request = await knex('die_requests').where({ id: file.request_id }).first();
  const press = request?.press_id ? await knex('presses').where({ id: request.press_id }).first() : null;

  let content: Uint8Array;
  try {
    content = await storage.get(file.s3_key);
  } catch (error) {
    await thisRun().update({ analysis_status: 'pending' });
    throw error;
  }
  let update: Record<string, unknown>;
  let result: 'done' | 'failed';
  try {
    const { metrics, preview } = await analyseDielineAsync(content, {
      fileName: file.file_name,
      layerMap: file.layer_map ?? {},
      page: file.pdf_page ?? undefined,
      layout: layoutOf(request),
      press: press ? { widthIn: Number(press.max_sheet_width_in), lengthIn: Number(press.max_sheet_length_in) } : null,
    });
    update = {
      analysis_status: 'done',
      analysis_error: null,
      metrics: JSON.stringify(metrics),
      preview: JSON.stringify(preview),
      analysed_at: new Date(),
    };
    result = 'done';
  } catch (error) {
    // Whatever the reading throws is about this file (a parser library's plain Error included):
    // settle it as failed, or it stays "measuring" and every sweep trips on it again.
    const reason = error instanceof DielineError ? error.message : UNREADABLE;
    update = {
      analysis_status: 'failed',
      analysis_error: reason,
      metrics: null,
      preview: null,
      analysed_at: new Date(),
    };
    result = 'failed';
  }
  const written = await thisRun().update(update);
  return written === 0 ? 'superseded' : result;
}

/**
 * Files whose analysis job was lost (Redis down or flushed), oldest first: waiting ones
 * uploaded more than `olderThanMs` ago, and runs that went stale. The claim decides who runs them.
 */
export async function waitingAnalyses(
  knex: Knex,
  olderThanMs: number,
  opts: { staleMs?: number; limit?: number } = {},
): Promise<number[]> {
  const rows = await knex('dieline_files')
    .where((q) => q.where('analysis_status', 'pending').orWhere((s) => staleRun(s, opts.staleMs ?? STALE_ANALYSIS_MS)))
    .andWhere('uploaded_at', '<', new Date(Date.now() - olderThanMs))
    .orderBy('id')
    .limit(opts.limit ?? 20)
    .select('id');
  return rows.map((r: { id: number }) => Number(r.id));
}
