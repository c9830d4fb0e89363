import { computed } from 'vue';
import { appRoutes } from '../router/appRoutes';
import { canAccess } from '../router/access';
import { useAuthStore } from '../stores/auth';

/** The menu for the signed-in user: every app route their organisation and role may open. */
export function useNavigation() {
  const auth = useAuthStore();
  return computed(() => {
    const me = auth.me;
    if (!me) return [];
    return appRoutes
      .filter((route) => !route.meta?.hidden && canAccess(me, route.meta?.access) && canAccess(me, route.meta?.nav))
      .map((route) => ({ name: String(route.name), title: route.meta?.title ?? String(route.name) }));
  });
}
