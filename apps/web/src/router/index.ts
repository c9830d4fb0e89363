import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router';
import { useAuthStore } from '../stores/auth';
import { canAccess } from './access';
import { appRoutes } from './appRoutes';
import { publicRoutes } from './publicRoutes';

export { appRoutes, publicRoutes };

// Vue Router ranks paths by how specific they are, so the catch-all among the public routes never hides these.
const routes: RouteRecordRaw[] = [
  ...publicRoutes,
  { path: '/', component: () => import('../layouts/AppLayout.vue'), children: appRoutes },
];

export const router = createRouter({ history: createWebHistory(), routes });

router.beforeEach(async (to) => {
  const auth = useAuthStore();
  if (to.meta.public) return true;
  if (!auth.signedIn) return { name: 'sign-in', query: to.fullPath !== '/' ? { next: to.fullPath } : {} };
  // Fetch the route's lazy views while the user is checked, not after: the browser caches the
  // modules, so the router's own import later finds them loaded.
  for (const record of to.matched) {
    for (const view of Object.values(record.components ?? {}))
      if (typeof view === 'function') void (view as () => Promise<unknown>)().catch(() => undefined);
  }
  try {
    const me = await auth.loadMe();
    if (!me) return { name: 'sign-in' };
    if (!canAccess(me, to.meta.access)) return { name: 'home' };
  } catch {
    // The API answered 401 (the store has signed out) or is unreachable: sign in again.
    if (!auth.signedIn) return { name: 'sign-in', query: { next: to.fullPath } };
  }
  return true;
});

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Kerfmark` : 'Kerfmark';
});
