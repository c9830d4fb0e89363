import type { Knex } from 'knex';

// The board of open requests shows a shop only the dies it can make, and the largest die board
// it can cut is one of the checks: the request row keeps its measured board beside the rule
// length, through the same trigger (migration 009).
const refresh = (withBoard: boolean) => `
  create or replace function refresh_request_measure(request integer) returns void language sql as $$
    update die_requests r set
      measured_rule_in = (m.metrics->'length'->>'total')::float8 - coalesce((m.metrics->'length'->>'other')::float8, 0),
      measured_complexity = m.metrics->>'complexity'${
        withBoard
          ? `,
      measured_board_width_in = nullif((m.metrics->'board'->>'width')::float8, 0),
      measured_board_height_in = nullif((m.metrics->'board'->>'height')::float8, 0)`
          : ''
      }
    from (select (select f.metrics from dieline_files f where f.request_id = request and f.analysis_status = 'done'
                  order by f.is_primary desc, f.uploaded_at desc, f.id desc limit 1) as metrics) m
    where r.id = request
  $$;`;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.double('measured_board_width_in').nullable();
    t.double('measured_board_height_in').nullable();
  });
  await knex.raw(refresh(true));
  await knex.raw('select refresh_request_measure(id) from die_requests');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(refresh(false));
  await knex.schema.alterTable('die_requests', (t) => {
    t.dropColumn('measured_board_width_in');
    t.dropColumn('measured_board_height_in');
  });
}
