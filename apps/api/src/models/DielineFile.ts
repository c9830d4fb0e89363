import type { DielineMetrics } from '@kerfmark/contracts';
import { Model, type QueryBuilder } from 'objection';

export type AnalysisStatus = 'pending' | 'analysing' | 'done' | 'failed';

export class DielineFile extends Model {
  static override tableName = 'dieline_files';

  id!: number;
  requestId!: number;
  uploadedBy!: number | null;
  fileName!: string;
  format!: 'dxf' | 'svg' | 'pdf';
  contentType!: string;
  byteSize!: number;
  sha256!: string;
  s3Key!: string;
  isPrimary!: boolean;
  analysisStatus!: AnalysisStatus;
  analysisError!: string | null;
  metrics!: DielineMetrics | null;
  preview!: unknown;
  layerMap!: Record<string, string>;
  pdfPage!: number | null;
  analysisAttempts!: number;
  analysedAt!: Date | null;
  uploadedAt!: Date;

  static override modifiers = {
    /** Every column but the preview geometry, which is large and fetched on its own. */
    byUpload(query: QueryBuilder<DielineFile>) {
      query.select(DielineFile.listColumns.map((c) => `dieline_files.${c}`)).orderBy('uploadedAt');
    },
  };

  static readonly listColumns = [
    'id',
    'request_id',
    'uploaded_by',
    'file_name',
    'format',
    'content_type',
    'byte_size',
    'sha256',
    's3_key',
    'is_primary',
    'analysis_status',
    'analysis_error',
    'metrics',
    'layer_map',
    'pdf_page',
    'analysis_attempts',
    'analysed_at',
    'uploaded_at',
  ];

  static override get jsonAttributes() {
    return ['metrics', 'preview', 'layerMap'];
  }
}
