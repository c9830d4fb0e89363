import { z } from 'zod';
import { Email, NewPassword } from './auth';
import { Role } from './roleSchemas';

export const PersonName = z
  .string({ error: 'Enter a name' })
  .trim()
  .min(1, 'Enter a name')
  .max(120, 'A name has at most 120 characters');

export const UserStatus = z.enum(['active', 'disabled']);
export type UserStatus = z.infer<typeof UserStatus>;

export const User = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: Role,
  status: UserStatus,
  createdAt: z.string(),
});
export type User = z.infer<typeof User>;

export const InvitationCreate = z.object({
  email: Email,
  name: PersonName,
  role: Role,
});
export type InvitationCreate = z.infer<typeof InvitationCreate>;

export const Invitation = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: Role,
  status: z.enum(['pending', 'accepted', 'expired', 'revoked']),
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof Invitation>;

export const InvitationAccept = z.object({
  token: z.string({ error: 'The invitation link is incomplete' }).min(20, 'The invitation link is incomplete').max(200),
  password: NewPassword,
});
export type InvitationAccept = z.infer<typeof InvitationAccept>;

/** The invitation link's token, which the accept page sends to show whose invitation it is. */
export const InvitationPreviewQuery = InvitationAccept.pick({ token: true });

/** What an invitee sees before choosing a password. */
export const InvitationPreview = z.object({
  email: z.string(),
  name: z.string(),
  role: Role,
  organisationName: z.string(),
});
export type InvitationPreview = z.infer<typeof InvitationPreview>;

export const UserUpdate = z
  .object({
    role: Role.optional(),
    status: UserStatus.optional(),
  })
  .refine((v) => v.role !== undefined || v.status !== undefined, { error: 'Nothing to change' });
export type UserUpdate = z.infer<typeof UserUpdate>;
