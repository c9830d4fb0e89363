import type { DisplayLocale, LengthUnits, LoginInput, LoginResult, Me } from '@kerfmark/contracts';
import { defineStore } from 'pinia';
import { computed, ref, watch } from 'vue';
import { displayLocale, lengthUnits } from '../format';
import { configureClient } from '../api/client';
import { authApi } from '../api/endpoints';

const STORAGE_KEY = 'kerfmark.session';

interface Session {
  token: string;
  expiresAt: string;
}

function readSession(): Session | null {
  try {
    const session = JSON.parse(localStorage.getItem(STORAGE_KEY) ?? 'null') as Session | null;
    return session && new Date(session.expiresAt).getTime() > Date.now() ? session : null;
  } catch {
    return null;
  }
}

export const useAuthStore = defineStore('auth', () => {
  const session = ref<Session | null>(readSession());
  const me = ref<Me | null>(null);
  const expiredNotice = ref(false);

  const signedIn = computed(() => session.value !== null);
  const isPrinter = computed(() => me.value?.organisation.kind === 'printer');
  const isAdmin = computed(() => me.value?.role === 'admin');
  /** The organisation's time zone: every date and deadline is shown in it. */
  const timeZone = computed(() => me.value?.organisation.timeZone ?? 'UTC');
  // Every length the app shows follows the user's units (format.ts).
  // …and every date and number its locale.
  watch(
    () => [me.value?.lengthUnits, me.value?.locale] as const,
    ([units, locale]) => {
      lengthUnits.value = units ?? 'in';
      displayLocale.value = locale ?? 'en-US';
    },
    { immediate: true },
  );
  /** After the user changes the units or the locale in the preferences. */
  function setDisplay(change: { lengthUnits?: LengthUnits; locale?: DisplayLocale }) {
    if (me.value) me.value = { ...me.value, ...change };
  }

  function keep(result: LoginResult) {
    session.value = { token: result.token, expiresAt: result.expiresAt };
    localStorage.setItem(STORAGE_KEY, JSON.stringify(session.value));
    expiredNotice.value = false;
  }

  function forget() {
    session.value = null;
    me.value = null;
    localStorage.removeItem(STORAGE_KEY);
  }

  configureClient({
    token: () => session.value?.token ?? null,
    unauthorised: () => {
      forget();
      expiredNotice.value = true;
    },
  });

  async function signIn(input: LoginInput) {
    keep(await authApi.login(input));
    me.value = await authApi.me();
  }

  /** Signs in with a token from elsewhere (an accepted invitation). */
  async function adopt(result: LoginResult) {
    keep(result);
    me.value = await authApi.me();
  }

  async function loadMe(): Promise<Me | null> {
    if (!session.value) return null;
    if (!me.value) me.value = await authApi.me();
    return me.value;
  }

  async function signOut() {
    try {
      if (session.value) await authApi.logout();
    } finally {
      forget();
    }
  }

  return {
    session,
    me,
    signedIn,
    isPrinter,
    isAdmin,
    timeZone,
    expiredNotice,
    signIn,
    adopt,
    loadMe,
    signOut,
    setDisplay,
  };
});
