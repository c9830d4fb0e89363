import type { Knex } from 'knex';

// The reminder jobs last planned for each request, so that planning again removes exactly the
// ones that no longer apply without scanning the queue.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('reminders_planned', (t) => {
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.text('job_id').notNullable();
    t.primary(['request_id', 'job_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('reminders_planned');
}
