import type {
  Invitation,
  InvitationAccept,
  InvitationCreate,
  InvitationPreview,
  LoginInput,
  LoginResult,
  Me,
  Press,
  PressCreate,
  PressUpdate,
  User,
  UserUpdate,
} from '@kerfmark/contracts';
import { api } from './client';

export const authApi = {
  login: (input: LoginInput) => api<LoginResult>('/auth/login', { method: 'POST', body: input }),
  logout: () => api<void>('/auth/logout', { method: 'POST' }),
  me: () => api<Me>('/me'),
};

export const usersApi = {
  list: () => api<User[]>('/users'),
  invite: (input: InvitationCreate) => api<Invitation>('/users', { method: 'POST', body: input }),
  update: (id: number, patch: UserUpdate) => api<User>(`/users/${id}`, { method: 'PATCH', body: patch }),
};

export const invitationsApi = {
  list: () => api<Invitation[]>('/invitations'),
  resend: (id: number) => api<Invitation>(`/invitations/${id}/resend`, { method: 'POST' }),
  revoke: (id: number) => api<Invitation>(`/invitations/${id}/revoke`, { method: 'POST' }),
  preview: (token: string) => api<InvitationPreview>(`/invitations/preview?token=${encodeURIComponent(token)}`),
  accept: (input: InvitationAccept) => api<LoginResult>('/invitations/accept', { method: 'POST', body: input }),
};

export const pressesApi = {
  list: () => api<Press[]>('/presses'),
  create: (input: PressCreate) => api<Press>('/presses', { method: 'POST', body: input }),
  update: (id: number, patch: PressUpdate) => api<Press>(`/presses/${id}`, { method: 'PATCH', body: patch }),
};
