import type { Knex } from 'knex';

// An organisation's profile: the legal name, office address and contact e-mail that purchase
// orders print; a printer's payment terms and delivery points; a die shop's capabilities. Each
// kind's fields stay empty on the other kind. Capabilities left null are not stated yet.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('organisations', (t) => {
    t.text('legal_name');
    t.text('office_address');
    t.text('contact_email');
    t.text('payment_terms');
    t.jsonb('delivery_points').notNullable().defaultTo('[]');
    t.specificType('die_kinds', 'text[]').notNullable().defaultTo('{}');
    t.decimal('max_board_width_in', 6, 2);
    t.decimal('max_board_length_in', 6, 2);
    t.specificType('rule_heights_in', 'numeric(5,3)[]').notNullable().defaultTo('{}');
    t.boolean('makes_counters');
    t.boolean('fits_ejection_rubber');
    t.boolean('laser_cut_boards');
  });
  await knex.raw(`alter table organisations
    add constraint organisations_profile_text_check check (
      char_length(legal_name) between 1 and 200
      and char_length(office_address) between 1 and 500
      and char_length(contact_email) between 3 and 254
      and char_length(payment_terms) between 1 and 120),
    add constraint organisations_delivery_points_check check (
      jsonb_typeof(delivery_points) = 'array'
      and (kind = 'printer' or delivery_points = '[]'::jsonb)),
    add constraint organisations_payment_terms_check check (kind = 'printer' or payment_terms is null),
    add constraint organisations_die_kinds_check check (
      die_kinds <@ array['flat', 'rotary']::text[]
      and (kind = 'die_shop' or cardinality(die_kinds) = 0)),
    add constraint organisations_board_check check (
      max_board_width_in between 1 and 200
      and max_board_length_in between 1 and 200
      and (max_board_width_in is null) = (max_board_length_in is null)
      and (kind = 'die_shop' or max_board_width_in is null)),
    add constraint organisations_rule_heights_check check (
      rule_heights_in <@ array[0.937, 0.918]::numeric[]
      and (kind = 'die_shop' or cardinality(rule_heights_in) = 0)),
    add constraint organisations_capabilities_check check (
      kind = 'die_shop'
      or (makes_counters is null and fits_ejection_rubber is null and laser_cut_boards is null))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('organisations', (t) => {
    t.dropChecks([
      'organisations_profile_text_check',
      'organisations_delivery_points_check',
      'organisations_payment_terms_check',
      'organisations_die_kinds_check',
      'organisations_board_check',
      'organisations_rule_heights_check',
      'organisations_capabilities_check',
    ]);
    t.dropColumns(
      'legal_name',
      'office_address',
      'contact_email',
      'payment_terms',
      'delivery_points',
      'die_kinds',
      'max_board_width_in',
      'max_board_length_in',
      'rule_heights_in',
      'makes_counters',
      'fits_ejection_rubber',
      'laser_cut_boards',
    );
  });
}
