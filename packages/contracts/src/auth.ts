import { z } from 'zod';
import { OrgKind, Role } from './roleSchemas';

export const Email = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .max(254, 'An e-mail address has at most 254 characters')
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

/** Password rules for new passwords (sign-in accepts whatever was set). */
export const NewPassword = z
  .string({ error: 'Enter a password' })
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const LoginInput = z.object({
  email: Email,
  password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(200),
});
export type LoginInput = z.infer<typeof LoginInput>;

export const LoginResult = z.object({
  token: z.string(),
  expiresAt: z.string(),
});
export type LoginResult = z.infer<typeof LoginResult>;

export const Organisation = z.object({
  id: z.number().int(),
  name: z.string(),
  kind: OrgKind,
  timeZone: z.string(),
});
export type Organisation = z.infer<typeof Organisation>;

/** How lengths are shown: inches, or millimetres (1 in = 25.4 mm exactly). */
export const LengthUnits = z.enum(['in', 'mm'], { error: 'Choose in or mm' });
export type LengthUnits = z.infer<typeof LengthUnits>;

/** How dates and numbers are written: US English (Dec 5, 2026) or British English (5 Dec 2026). */
export const DisplayLocale = z.enum(['en-US', 'en-GB'], { error: 'Choose en-US or en-GB' });
export type DisplayLocale = z.infer<typeof DisplayLocale>;

export const Me = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: Role,
  organisation: Organisation,
  /** The user's own choice, else the organisation's default. */
  lengthUnits: LengthUnits,
  /** The user's own choice, else the organisation's default. */
  locale: DisplayLocale,
});
export type Me = z.infer<typeof Me>;
