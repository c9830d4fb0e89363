import type { Knex } from 'knex';
import { Notification, User } from '../models';
import type { EmailDispatcher } from './deps';
import { queueEmail } from './emailOutbox';
import { emailLayout } from './emails/layout';

export interface Notice {
  kind: string;
  title: string;
  body: string;
  /** A path in the app, e.g. /requests/12; e-mails carry it as a full link. */
  link: string;
}

/**
 * Tells every active user of an organisation: an in-app notification each, and an e-mail each
 * through the outbox, all inside the caller's transaction.
 */
export async function notifyOrganisation(
  trx: Knex.Transaction,
  deps: { emails: EmailDispatcher; appUrl: string },
  organisationId: number,
  notice: Notice,
): Promise<void> {
  const users = await User.query(trx).where({ organisationId, status: 'active' });
  for (const user of users) {
    await Notification.query(trx).insert({ userId: user.id, ...notice });
    const email = emailLayout({
      subject: notice.title,
      greeting: `Hello ${user.name},`,
      paragraphs: [notice.body],
      action: { label: 'Open in Kerfmark', url: `${deps.appUrl}${notice.link}` },
      footer: 'You receive this because you are a member of your organisation on Kerfmark.',
    });
    await queueEmail(trx, deps.emails, { ...email, to: user.email, kind: notice.kind });
  }
}
