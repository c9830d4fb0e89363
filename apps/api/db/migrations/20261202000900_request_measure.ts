import type { Knex } from 'knex';

// The board of open requests filters and sorts on the measured dieline of each request. Reading
// it from the files' JSON for every open request made the board's cost grow with the files, so
// the request row keeps its own copy: the priced rule (all rule but 'other') and the complexity
// of its measured file (the one marked primary, else the newest analysed). A trigger keeps the
// copy in step with every write to the files, whoever writes them (API, worker, seed).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.double('measured_rule_in').nullable();
    t.text('measured_complexity').nullable();
  });
  await knex.raw(`
    create function refresh_request_measure(request integer) returns void language sql as $$
      update die_requests r set
        measured_rule_in = (m.metrics->'length'->>'total')::float8 - coalesce((m.metrics->'length'->>'other')::float8, 0),
        measured_complexity = m.metrics->>'complexity'
      from (select (select f.metrics from dieline_files f where f.request_id = request and f.analysis_status = 'done'
                    order by f.is_primary desc, f.uploaded_at desc, f.id desc limit 1) as metrics) m
      where r.id = request
    $$;
    create function dieline_files_measure() returns trigger language plpgsql as $$
    begin
      if tg_op in ('UPDATE', 'DELETE') then perform refresh_request_measure(old.request_id); end if;
      if tg_op in ('INSERT', 'UPDATE') and (tg_op = 'INSERT' or new.request_id <> old.request_id) then
        perform refresh_request_measure(new.request_id);
      end if;
      return null;
    end $$;
    create trigger dieline_files_measure after insert or delete or update of metrics, analysis_status, is_primary, request_id
      on dieline_files for each row execute function dieline_files_measure();
    select refresh_request_measure(id) from die_requests;
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists dieline_files_measure on dieline_files');
  await knex.raw(
    'drop function if exists dieline_files_measure(); drop function if exists refresh_request_measure(integer)',
  );
  await knex.schema.alterTable('die_requests', (t) => {
    t.dropColumn('measured_rule_in');
    t.dropColumn('measured_complexity');
  });
}
