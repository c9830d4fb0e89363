import type { Knex } from 'knex';

// The board lists open requests by bid deadline, then id (so that pages are stable when deadlines
// tie, as they do when a printer posts a batch). With the id in the index, PostgreSQL reads the
// first page straight from it and stops; without, it sorted every open request sharing a deadline.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.index(['status', 'bid_deadline', 'id']);
    t.dropIndex(['status', 'bid_deadline']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.index(['status', 'bid_deadline']);
    t.dropIndex(['status', 'bid_deadline', 'id']);
  });
}
