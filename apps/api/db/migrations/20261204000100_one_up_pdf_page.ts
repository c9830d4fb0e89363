import type { Knex } from 'knex';

// A request's dieline may be one up, stepped and repeated into the whole die: ups across and
// along, the gutter between them, and which way the grain must run across the piece. A PDF
// dieline may be measured on a page the buyer picks.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.text('dieline_shows').notNullable().defaultTo('whole-die');
    t.integer('ups_across');
    t.integer('ups_along');
    t.decimal('gutter_in', 6, 4);
    t.text('piece_grain');
  });
  await knex.raw(`alter table die_requests
    add constraint die_requests_dieline_shows_check check (dieline_shows in ('whole-die', 'one-up')),
    add constraint die_requests_ups_grid_check check (ups_across between 1 and 100 and ups_along between 1 and 100),
    add constraint die_requests_gutter_check check (gutter_in between 0 and 10),
    add constraint die_requests_piece_grain_check check (piece_grain in ('either', 'with-width', 'with-height'))`);
  await knex.schema.alterTable('dieline_files', (t) => {
    t.integer('pdf_page');
  });
  await knex.raw('alter table dieline_files add constraint dieline_files_pdf_page_check check (pdf_page >= 1)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('dieline_files', (t) => {
    t.dropChecks('dieline_files_pdf_page_check');
    t.dropColumn('pdf_page');
  });
  await knex.schema.alterTable('die_requests', (t) => {
    t.dropChecks([
      'die_requests_dieline_shows_check',
      'die_requests_ups_grid_check',
      'die_requests_gutter_check',
      'die_requests_piece_grain_check',
    ]);
    t.dropColumns('dieline_shows', 'ups_across', 'ups_along', 'gutter_in', 'piece_grain');
  });
}
