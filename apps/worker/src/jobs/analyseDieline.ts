import { analyseDieline, DielineError } from '@kerfmark/dieline';
import type { Storage } from '@kerfmark/storage';
import type { Knex } from 'knex';

const UNREADABLE = 'Kerfmark could not measure this file. Save it again from your drawing program as DXF, SVG or PDF and upload it again.';

export type AnalysisResult = 'done' | 'failed' | 'skipped';

/**
 * Measures one uploaded dieline and stores its metrics and preview. A file that cannot be read
 * keeps its upload and gets the reason; a store or database that is down throws, so the queue
 * retries (and the sweep after that).
 */
export async function analyseDielineFile(knex: Knex, storage: Storage, fileId: number): Promise<AnalysisResult> {
  const file = await knex('dieline_files').where({ id: fileId }).first();
  if (!file || file.analysis_status === 'done' || file.analysis_status === 'failed') return 'skipped';
  await knex('dieline_files').where({ id: fileId }).update({ analysis_status: 'analysing' });
  const request = await knex('die_requests').where({ id: file.request_id }).first();
  const press = request?.press_id ? await knex('presses').where({ id: request.press_id }).first() : null;

  let content: Uint8Array;
  try {
    content = await storage.get(file.s3_key);
  } catch (error) {
    await knex('dieline_files').where({ id: fileId }).update({ analysis_status: 'pending' });
    throw error;
  }
  let measured: ReturnType<typeof analyseDieline>;
  try {
    measured = analyseDieline(content, {
      fileName: file.file_name,
      layerMap: file.layer_map ?? {},
      press: press ? { widthIn: Number(press.max_sheet_width_in), lengthIn: Number(press.max_sheet_length_in) } : null,
    });
  } catch (error) {
    // Whatever the reading throws is about this file (a parser library's plain Error included):
    // settle it as failed, or it stays "measuring" and every sweep trips on it again.
    const reason = error instanceof DielineError ? error.message : UNREADABLE;
    await knex('dieline_files')
      .where({ id: fileId })
      .update({ analysis_status: 'failed', analysis_error: reason, metrics: null, preview: null, analysed_at: new Date() });
    return 'failed';
  }
  await knex('dieline_files')
    .where({ id: fileId })
    .update({
      analysis_status: 'done',
      analysis_error: null,
      metrics: JSON.stringify(measured.metrics),
      preview: JSON.stringify(measured.preview),
      analysed_at: new Date(),
    });
  return 'done';
}

/** Files whose analysis job was lost (Redis down or flushed), oldest first. */
export async function waitingAnalyses(knex: Knex, olderThanMs: number, limit = 20): Promise<number[]> {
  const rows = await knex('dieline_files')
    .whereIn('analysis_status', ['pending', 'analysing'])
    .andWhere('uploaded_at', '<', new Date(Date.now() - olderThanMs))
    .orderBy('id')
    .limit(limit)
    .pluck('id');
  return rows.map(Number);
}
