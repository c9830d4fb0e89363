import type { Knex } from 'knex';

// After the die ships, the awarded shop invoices the purchase order; purchasing matches the
// invoice against the order and the receipt, disputes or approves it, and records its payment.
// Every version of an invoice is kept: a revision is a new row that `replaces` the one disputed,
// which becomes superseded; a credit note is a row of its own against the invoice it `credits`.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('organisations', (t) => {
    // A printer's: the largest difference the three-way match lets through, and its own net days.
    t.bigInteger('invoice_tolerance_cents').notNullable().defaultTo(0);
    t.integer('payment_net_days');
  });
  await knex.raw(`alter table organisations
    add constraint organisations_invoice_tolerance check (invoice_tolerance_cents >= 0),
    add constraint organisations_payment_net_days check (payment_net_days between 0 and 365)`);

  // Each shop's own invoice numbers: one counter row per shop, taken inside the invoice's insert.
  await knex.schema.createTable('invoice_sequences', (t) => {
    t.integer('shop_id').primary().references('organisations.id').onDelete('CASCADE');
    t.integer('last_number').notNullable().checkPositive();
  });

  await knex.schema.createTable('invoices', (t) => {
    t.increments('id');
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.integer('award_id').notNullable().references('awards.id').onDelete('CASCADE');
    t.integer('shop_id').notNullable().references('organisations.id');
    t.integer('printer_id').notNullable().references('organisations.id');
    t.integer('number').notNullable();
    t.integer('version').notNullable().defaultTo(1);
    t.integer('replaces_id').references('invoices.id');
    t.integer('credits_id').references('invoices.id');
    t.text('kind').notNullable().checkIn(['invoice', 'credit_note']);
    t.text('status').notNullable().defaultTo('submitted');
    t.date('invoice_date').notNullable();
    t.date('due_date').notNullable();
    t.string('currency', 3).notNullable();
    t.integer('dies').notNullable().defaultTo(1);
    t.jsonb('lines').notNullable();
    t.bigInteger('subtotal_cents').notNullable();
    t.integer('tax_rate_bp');
    t.bigInteger('tax_cents').notNullable().defaultTo(0);
    t.bigInteger('total_cents').notNullable();
    t.text('dispute_reason');
    t.text('approval_reason');
    t.integer('raised_by').references('users.id').onDelete('SET NULL');
    t.integer('disputed_by').references('users.id').onDelete('SET NULL');
    t.timestamp('disputed_at', { useTz: true });
    t.integer('approved_by').references('users.id').onDelete('SET NULL');
    t.timestamp('approved_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['shop_id', 'number']);
    t.index(['request_id']);
    t.index(['printer_id']);
  });
  await knex.raw(`alter table invoices
    add constraint invoices_status check (status in ('submitted', 'disputed', 'approved', 'paid', 'superseded')),
    add constraint invoices_version check (version >= 1),
    add constraint invoices_dies check (dies between 0 and 1000),
    add constraint invoices_tax_rate check (tax_rate_bp between 0 and 10000),
    add constraint invoices_totals check (total_cents = subtotal_cents + tax_cents),
    add constraint invoices_signs check (
      case kind when 'invoice' then subtotal_cents >= 0 and tax_cents >= 0
                else subtotal_cents <= 0 and tax_cents <= 0 and credits_id is not null end),
    add constraint invoices_due check (due_date >= invoice_date),
    add constraint invoices_lines check (jsonb_typeof(lines) = 'array')`);
  // At most one open invoice (not superseded) per request; credit notes sit beside it.
  await knex.raw(`create unique index invoices_one_open on invoices (request_id)
    where kind = 'invoice' and status <> 'superseded'`);

  await knex.schema.createTable('invoice_payments', (t) => {
    t.increments('id');
    t.integer('invoice_id').notNullable().references('invoices.id').onDelete('CASCADE');
    t.date('paid_on').notNullable();
    t.text('reference').notNullable();
    t.bigInteger('amount_cents').notNullable().checkPositive();
    t.integer('recorded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('recorded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['invoice_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('invoice_payments');
  await knex.schema.dropTableIfExists('invoices');
  await knex.schema.dropTableIfExists('invoice_sequences');
  await knex.schema.alterTable('organisations', (t) => t.dropColumns('invoice_tolerance_cents', 'payment_net_days'));
}
