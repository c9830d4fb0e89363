import type { Knex } from 'knex';

// Several workers may reach the same file (its job in one, the sweep for lost jobs in another):
// a worker measures a file only after claiming it with a conditional update, which records when
// the run started (so a run whose worker died can be claimed again later) and counts the runs.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('dieline_files', (t) => {
    t.timestamp('analysis_started_at', { useTz: true });
    t.integer('analysis_runs').notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('dieline_files', (t) => {
    t.dropColumn('analysis_started_at');
    t.dropColumn('analysis_runs');
  });
}
