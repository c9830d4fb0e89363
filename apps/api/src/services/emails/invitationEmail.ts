import { formatInZone, roleLabels, type Role } from '@kerfmark/contracts';
import { emailLayout, type EmailParts } from '@kerfmark/notices';

export function invitationEmail(opts: {
  name: string;
  role: Role;
  organisationName: string;
  inviterName: string;
  acceptUrl: string;
  expiresAt: Date;
  timeZone: string;
}): EmailParts {
  const expires = formatInZone(opts.expiresAt, opts.timeZone);
  return emailLayout({
    subject: `${opts.inviterName} invited you to ${opts.organisationName} on Kerfmark`,
    greeting: `Hello ${opts.name},`,
    paragraphs: [
      `${opts.inviterName} has invited you to join ${opts.organisationName} on Kerfmark as ${roleLabels[opts.role].toLowerCase()}.`,
      `Choose a password to accept. The link works until ${expires}.`,
    ],
    action: { label: 'Accept the invitation', url: opts.acceptUrl },
    footer: 'If you did not expect this invitation, you can ignore this e-mail.',
  });
}
