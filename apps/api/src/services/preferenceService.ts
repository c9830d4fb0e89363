import {
  notificationKinds,
  type DisplayLocale,
  type LengthUnits,
  type NotificationKind,
  type PreferencesDto,
} from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import { Organisation, User } from '../models';

/** Which notices also come by e-mail: every kind is on until the user turns it off. */
export function emailPreferencesOf(stored: Record<string, boolean> | null | undefined): PreferencesDto['email'] {
  return Object.fromEntries(notificationKinds.map((k) => [k, stored?.[k] !== false])) as PreferencesDto['email'];
}

async function preferencesDto(actor: AuthUser): Promise<PreferencesDto> {
  const user = await User.query().findById(actor.id).select('preferences', 'lengthUnits', 'locale').throwIfNotFound();
  const organisation = await Organisation.query()
    .findById(actor.organisationId)
    .select('lengthUnits', 'locale')
    .throwIfNotFound();
  return {
    email: emailPreferencesOf(user.preferences),
    lengthUnits: user.lengthUnits,
    organisationLengthUnits: organisation.lengthUnits,
    locale: user.locale,
    organisationLocale: organisation.locale,
  };
}

export const readPreferences = preferencesDto;

/** Changes only what is named: the e-mail kinds given, the length units and the locale when given. */
export async function updatePreferences(
  actor: AuthUser,
  change: {
    email?: Partial<Record<NotificationKind, boolean>>;
    lengthUnits?: LengthUnits | null;
    locale?: DisplayLocale | null;
  },
): Promise<PreferencesDto> {
  const user = await User.query().findById(actor.id).select('preferences');
  const patch: Partial<User> = { preferences: { ...(user?.preferences ?? {}), ...(change.email ?? {}) } };
  if (change.lengthUnits !== undefined) patch.lengthUnits = change.lengthUnits;
  if (change.locale !== undefined) patch.locale = change.locale;
  await User.query().patch(patch).findById(actor.id);
  return preferencesDto(actor);
}

/** The user's own settings. */
export function createPreferenceService() {
  return { read: readPreferences, update: updatePreferences };
}
