import { notificationKinds, type NotificationKind, type PreferencesDto } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { User } from '../models';

/** Which notices also come by e-mail: every kind is on until the user turns it off. */
export function preferencesOf(stored: Record<string, boolean> | null | undefined): PreferencesDto {
  return {
    email: Object.fromEntries(notificationKinds.map((k) => [k, stored?.[k] !== false])) as PreferencesDto['email'],
  };
}

export async function readPreferences(actor: AuthUser): Promise<PreferencesDto> {
  const user = await User.query().findById(actor.id).select('preferences');
  return preferencesOf(user?.preferences);
}

/** Changes only the kinds named; the others keep their setting. */
export async function updatePreferences(
  actor: AuthUser,
  email: Partial<Record<NotificationKind, boolean>>,
): Promise<PreferencesDto> {
  const user = await User.query().findById(actor.id).select('preferences');
  const preferences = { ...(user?.preferences ?? {}), ...email };
  await User.query().patch({ preferences }).findById(actor.id);
  return preferencesOf(preferences);
}

/** The user's own settings. */
export function createPreferenceService() {
  return { read: readPreferences, update: updatePreferences };
}
