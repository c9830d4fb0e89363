import type { DisplayLocale, LengthUnits, NotificationKind } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { emailLayout } from './emailLayout';

/** How one reader reads a notice: lengths, dates and numbers, and the clock, each as they chose. */
export interface Reader {
  lengthUnits: LengthUnits;
  locale: DisplayLocale;
  timeZone: string;
}

export interface Notice {
  kind: NotificationKind;
  title: string;
  /** The text, or a text written for each reader (lengths in their units, times in their zone). */
  body: string | ((reader: Reader) => string);
  /** A path in the app, e.g. /requests/12; e-mails carry it as a full link. */
  link: string;
}

/**
 * Tells the active users of an organisation (or only those with the given roles): an in-app
 * notification each, and an e-mail each through the outbox unless the user turned that kind of
 * e-mail off. Runs inside the caller's transaction and returns the outbox rows to deliver once
 * it commits. Plain knex with single-word or snake_case names, so that it works with and
 * without the API's snake-case mappers.
 */
export async function notifyOrganisation(
  trx: Knex.Transaction,
  opts: {
    appUrl: string;
    organisationId: number;
    roles?: readonly string[];
    onlyUserIds?: readonly number[];
    notice: Notice;
  },
): Promise<number[]> {
  const query = trx('users as u')
    .join('organisations as o', 'o.id', 'u.organisation_id')
    .where('u.organisation_id', opts.organisationId)
    .where('u.status', 'active')
    .select(
      'u.id',
      'u.email',
      'u.name',
      'u.preferences',
      // Single-word names: the API's mappers would turn length_units into lengthUnits.
      trx.raw('coalesce(u.length_units, o.length_units) as units'),
      trx.raw('coalesce(u.locale, o.locale) as locale'),
      'o.time_zone as zone',
    );
  if (opts.roles) query.whereIn('u.role', [...opts.roles]);
  if (opts.onlyUserIds) query.whereIn('u.id', [...opts.onlyUserIds]);
  const users = (await query) as Array<{
    id: number;
    email: string;
    name: string;
    preferences: Record<string, boolean> | null;
    units: LengthUnits;
    locale: DisplayLocale;
    zone: string;
  }>;
  const outbox: number[] = [];
  for (const user of users) {
    const body =
      typeof opts.notice.body === 'string'
        ? opts.notice.body
        : opts.notice.body({ lengthUnits: user.units, locale: user.locale, timeZone: user.zone });
    await trx('notifications').insert({
      user_id: user.id,
      kind: opts.notice.kind,
      title: opts.notice.title,
      body,
      link: opts.notice.link,
    });
    if (user.preferences?.[opts.notice.kind] === false) continue;
    const email = emailLayout({
      subject: opts.notice.title,
      greeting: `Hello ${user.name},`,
      paragraphs: [body],
      action: { label: 'Open in Kerfmark', url: `${opts.appUrl}${opts.notice.link}` },
      footer:
        'You receive this as a member of your organisation on Kerfmark. Choose which e-mails you get under Notifications.',
    });
    const [row] = await trx('email_outbox')
      .insert({
        to_address: user.email,
        subject: email.subject,
        text_body: email.text,
        html_body: email.html,
        kind: opts.notice.kind,
      })
      .returning('id');
    outbox.push(Number((row as { id: number }).id));
  }
  return outbox;
}
