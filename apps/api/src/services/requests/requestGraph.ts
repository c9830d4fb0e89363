import type { Knex } from 'knex';
import type { QueryBuilder } from 'objection';
import { TIES_PART } from '../../access/loadFacts';
import type { RequestTies } from '../../models';
import { SUBMITTED_BIDS_PART, toSubmittedBid } from '../bids/submittedBids';
import {
  DielineFile,
  type Award,
  type DieRequest,
  type Organisation,
  type Press,
  type RequestQuestion,
} from '../../models';

export type RequestPart =
  | 'organisation'
  | 'press'
  | 'award'
  | 'files'
  | 'fileSummaries'
  | 'questions'
  | 'invitedShops'
  | 'submittedBids'
  | 'ties';

// Remembered, as every row of every part asks for the same few names.
const camelNames = new Map<string, string>();
const camel = (key: string) => {
  let name = camelNames.get(key);
  if (name === undefined) camelNames.set(key, (name = key.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase())));
  return name;
};

/** A row the database sent as JSON, as the model reads it: camelCase keys, and instants (every *_at column) as Dates. */
function fromJson<M>(json: Record<string, unknown>): M {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(json))
    out[camel(key)] = key.endsWith('_at') && typeof value === 'string' ? new Date(value) : value;
  return out as M;
}

/** A request's files as a JSON array of the columns named, oldest first. */
const filesPart = (columns: readonly string[]) =>
  `(select coalesce(json_agg(json_build_object(${columns.map((c) => `'${c}', f.${c}`).join(', ')}) order by f.uploaded_at, f.id), '[]')
    from dieline_files f where f.request_id = die_requests.id)`;

// Each part as a subquery of the request row, built by PostgreSQL as JSON. Plain json, not
// jsonb: the text is all that is needed, and building jsonb cost about four times as much.
const PARTS: Record<RequestPart, string> = {
  organisation: '(select to_json(o) from organisations o where o.id = die_requests.organisation_id)',
  press: '(select to_json(p) from presses p where p.id = die_requests.press_id)',
  award: `(select row_to_json(x) from (select a.*, to_json(s) as shop from awards a join organisations s on s.id = a.shop_id
    where a.request_id = die_requests.id) x)`,
  // The preview geometry is large and read on its own, so the files leave it out.
  files: filesPart(DielineFile.listColumns),
  // What a list of requests reads of the files: enough to pick the primary one and show its figures.
  fileSummaries: filesPart(['id', 'is_primary', 'analysis_status', 'metrics']),
  questions: `(select coalesce(json_agg(q order by q.asked_at, q.id), '[]') from request_questions q where q.request_id = die_requests.id)`,
  invitedShops: `(select coalesce(json_agg(json_build_object('id', o.id, 'name', o.name) order by o.name), '[]')
    from request_invitations i join organisations o on o.id = i.shop_id where i.request_id = die_requests.id)`,
  submittedBids: SUBMITTED_BIDS_PART,
  // The shops tied to the request, for the access rules (never shown as such).
  ties: TIES_PART,
};

/** Turns the parts the database sent as JSON into the request's relations, as plain objects in the models' shape. */
function adoptParts(request: DieRequest, parts: RequestPart[]): DieRequest {
  const row = request as unknown as Record<string, unknown>;
  for (const part of parts) {
    const key = `part${part[0]!.toUpperCase()}${part.slice(1)}`;
    const one = row[key] as (Record<string, unknown> & { shop?: Record<string, unknown> }) | null;
    const many = (row[key] ?? []) as Array<Record<string, unknown>>;
    delete row[key];
    if (part === 'organisation') request.organisation = one ? fromJson<Organisation>(one) : undefined;
    if (part === 'press') request.press = one ? fromJson<Press>(one) : null;
    if (part === 'award')
      request.award = one ? ({ ...fromJson<Award>(one), shop: fromJson<Organisation>(one.shop!) } as Award) : null;
    if (part === 'files' || part === 'fileSummaries') request.files = many.map((f) => fromJson<DielineFile>(f));
    if (part === 'questions') request.questions = many.map((q) => fromJson<RequestQuestion>(q));
    if (part === 'invitedShops') request.invitedShops = many.map((o) => fromJson<Organisation>(o));
    if (part === 'ties') request.ties = one as unknown as RequestTies;
    if (part === 'submittedBids')
      request.submittedBids = (many as Array<Parameters<typeof toSubmittedBid>[0]>).map(toSubmittedBid);
  }
  return request;
}

/**
 * Reads requests with the parts named, in one query: the views read most (open requests, a
 * request's page, the bid comparison) would otherwise spend a query and a model graph on each
 * part. `query` is already narrowed to what the user may see; the views only read the parts.
 * `columns` are the request's own columns to read (a list reads fewer than a request's page).
 */
export async function readRequestGraph<
  Q extends QueryBuilder<DieRequest, DieRequest | undefined> | QueryBuilder<DieRequest, DieRequest[]>,
>(
  knex: Knex,
  query: Q,
  parts: RequestPart[],
  columns: readonly string[] = ['*'],
): Promise<Q extends QueryBuilder<DieRequest, DieRequest[]> ? DieRequest[] : DieRequest | undefined> {
  const builder = query as QueryBuilder<DieRequest, DieRequest[]>;
  // Prepared: the text depends only on the parts and the narrowing, so it is one of a few.
  const result = (await builder
    .select(
      ...columns.map((c) => `die_requests.${c}`),
      ...parts.map((part) => knex.raw(`${PARTS[part]} as ??`, [`part_${part}`])),
    )
    .onBuildKnex((knexQuery) => knexQuery.options({ prepare: true }))) as DieRequest | DieRequest[] | undefined;
  const adopted = Array.isArray(result) ? result.map((r) => adoptParts(r, parts)) : result && adoptParts(result, parts);
  return adopted as never;
}
