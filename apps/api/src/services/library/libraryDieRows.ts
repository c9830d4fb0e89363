import type { DielineMetrics, LibraryDieDto, RuleType } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';

/** Dies at or past 90 % of their impression limit are flagged for replacement (common practice). */
export const END_OF_LIFE_SHARE = 0.9;

/** A library die as `visibleDies` reads it (numerics arrive from PostgreSQL as text). */
export interface LibraryDieRow {
  id: number;
  name: string;
  organisationId: number;
  ownerName: string | null;
  requestId: number | null;
  pieceWidthIn: string | number | null;
  pieceHeightIn: string | number | null;
  ups: number;
  ruleTypes: RuleType[];
  pressName: string | null;
  storageLocation: string | null;
  condition: LibraryDieDto['condition'];
  impressions: string | number;
  impressionLimit: string | number | null;
  lastUsedOn: string | null;
  listed: boolean;
  metrics: DielineMetrics | null;
  preview?: unknown;
}

/** The printer's own dies, and every die shop's listed stock dies. */
export function visibleDies(knex: Knex, actor: AuthUser): Knex.QueryBuilder<LibraryDieRow, LibraryDieRow[]> {
  return knex<LibraryDieRow, LibraryDieRow[]>('libraryDies as d')
    .join('organisations as o', 'o.id', 'd.organisationId')
    .leftJoin('presses as p', 'p.id', 'd.pressId')
    .where((q) =>
      q
        .where('d.organisationId', actor.organisationId)
        .orWhere((l) => l.where('d.listed', true).where('o.kind', 'die_shop')),
    )
    .select(
      'd.id',
      'd.name',
      'd.organisationId',
      'o.name as ownerName',
      'd.requestId',
      'd.pieceWidthIn',
      'd.pieceHeightIn',
      'd.ups',
      'd.ruleTypes',
      'p.name as pressName',
      'd.storageLocation',
      'd.condition',
      'd.impressions',
      'd.impressionLimit',
      'd.lastUsedOn',
      'd.listed',
      'd.metrics',
    );
}

const numberOrNull = (value: string | number | null) => (value === null ? null : Number(value));

export function toLibraryDieDto(row: LibraryDieRow, actor: AuthUser): LibraryDieDto {
  const impressions = Number(row.impressions);
  const limit = numberOrNull(row.impressionLimit);
  return {
    id: row.id,
    name: row.name,
    ownerName: row.ownerName ?? '',
    mine: row.organisationId === actor.organisationId,
    requestId: row.requestId,
    pieceWidthIn: numberOrNull(row.pieceWidthIn),
    pieceHeightIn: numberOrNull(row.pieceHeightIn),
    ups: row.ups,
    ruleTypes: row.ruleTypes,
    pressName: row.pressName,
    storageLocation: row.storageLocation,
    condition: row.condition,
    impressions,
    impressionLimit: limit,
    nearEndOfLife: limit !== null && impressions >= limit * END_OF_LIFE_SHARE,
    lastUsedOn: row.lastUsedOn,
    listed: row.listed,
    metrics: row.metrics,
  };
}
