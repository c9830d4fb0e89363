// The demo scenario: invented printers, die shops, people and presses. Safe to load twice.
import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';
import type { Storage } from '@kerfmark/storage';
import { seedHistory } from './demoHistory';
import { seedRateCards } from './demoRateCards';
import { seedHolidays } from './demoHolidays';
import { DEMO_PASSWORD, demoOrganisations, profileColumns } from './demoPeople';
import { seedRequests } from './demoRequests';

export { DEMO_PASSWORD, demoOrganisations };

export async function seedDemo(knex: Knex, opts: { storage?: Storage; bcryptRounds?: number } = {}): Promise<void> {
  const bcryptRounds = opts.bcryptRounds ?? 10;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptRounds);
  await knex.transaction(async (trx) => {
    for (const org of demoOrganisations) {
      const place = {
        country: org.country ?? 'US',
        lengthUnits: org.lengthUnits ?? 'in',
        locale: org.locale ?? 'en-US',
      };
      const [row] = await trx('organisations')
        .insert({ name: org.name, kind: org.kind, timeZone: org.timeZone, postcode: org.postcode, ...place })
        .onConflict('name')
        .merge(['kind', 'timeZone', 'postcode', 'country', 'lengthUnits', 'locale'])
        .returning('id');
      const organisationId = (row as { id: number }).id;
      // The demo's profile until someone has filled one in: a second seed keeps their edits.
      await trx('organisations')
        .where({ id: organisationId })
        .whereNull('legalName')
        .update(profileColumns(org.profile));
      for (const user of org.users) {
        await trx('users')
          .insert({ ...user, organisationId, passwordHash, status: 'active' })
          .onConflict('email')
          .ignore();
      }
      for (const press of org.presses ?? []) {
        await trx('presses')
          .insert({ ...press, organisationId })
          .onConflict(['organisationId', 'name'])
          .ignore();
      }
    }
  });
  await seedHolidays(knex);
  if (opts.storage) {
    await seedRequests(knex, opts.storage);
    await seedHistory(knex, opts.storage);
    await seedRateCards(knex);
  }
}
