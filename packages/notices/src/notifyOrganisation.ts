import type { NotificationKind } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { emailLayout } from './emailLayout';

export interface Notice {
  kind: NotificationKind;
  title: string;
  body: string;
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
  const query = trx('users')
    .where('organisation_id', opts.organisationId)
    .where('status', 'active')
    .select('id', 'email', 'name', 'preferences');
  if (opts.roles) query.whereIn('role', [...opts.roles]);
  if (opts.onlyUserIds) query.whereIn('id', [...opts.onlyUserIds]);
  const users = (await query) as Array<{
    id: number;
    email: string;
    name: string;
    preferences: Record<string, boolean> | null;
  }>;
  const outbox: number[] = [];
  for (const user of users) {
    await trx('notifications').insert({
      user_id: user.id,
      kind: opts.notice.kind,
      title: opts.notice.title,
      body: opts.notice.body,
      link: opts.notice.link,
    });
    if (user.preferences?.[opts.notice.kind] === false) continue;
    const email = emailLayout({
      subject: opts.notice.title,
      greeting: `Hello ${user.name},`,
      paragraphs: [opts.notice.body],
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
