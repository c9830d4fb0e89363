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
  /** The address already has an account with another organisation: say so and what to do, in the e-mail only. */
  hasAccount?: boolean;
  signInUrl?: string;
}): EmailParts {
  const expires = formatInZone(opts.expiresAt, opts.timeZone);
  if (opts.hasAccount) {
    return emailLayout({
      subject: `${opts.inviterName} invited you to ${opts.organisationName} on Kerfmark`,
      greeting: `Hello ${opts.name},`,
      paragraphs: [
        `${opts.inviterName} has invited you to join ${opts.organisationName} on Kerfmark as ${roleLabels[opts.role].toLowerCase()}.`,
        'This e-mail address already has a Kerfmark account, and an account belongs to one organisation, so this invitation cannot be accepted with it.',
        `To join ${opts.organisationName}, ask ${opts.inviterName} to invite another address of yours. To move this address, ask the admin of the organisation it belongs to now to remove it first, then ask for a new invitation.`,
        `${opts.organisationName} has not been told that this address has an account.`,
      ],
      action: { label: 'Sign in to your account', url: opts.signInUrl ?? opts.acceptUrl },
      footer: 'If you did not expect this invitation, you can ignore this e-mail.',
    });
  }
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
