import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router';
import { useAuthStore } from '../stores/auth';
import { canAccess, type Access } from './access';

declare module 'vue-router' {
  interface RouteMeta {
    public?: boolean;
    access?: Access;
    title?: string;
    /** Not listed in the navigation (reached from another page). */
    hidden?: boolean;
  }
}

export const appRoutes: RouteRecordRaw[] = [
  { path: '', name: 'home', component: () => import('../views/HomeView.vue'), meta: { title: 'Home' } },
  {
    path: 'requests',
    name: 'requests',
    component: () => import('../views/RequestsView.vue'),
    meta: { title: 'Die requests', access: { kinds: ['printer'] } },
  },
  {
    path: 'requests/new',
    name: 'request-new',
    component: () => import('../views/RequestFormView.vue'),
    meta: { title: 'New die request', access: { kinds: ['printer'] }, hidden: true },
  },
  {
    path: 'requests/:id(\\d+)/edit',
    name: 'request-edit',
    component: () => import('../views/RequestFormView.vue'),
    meta: { title: 'Die request', access: { kinds: ['printer'] }, hidden: true },
  },
  {
    path: 'requests/:id(\\d+)',
    name: 'request',
    component: () => import('../views/RequestDetailView.vue'),
    meta: { title: 'Die request', hidden: true },
  },
  {
    path: 'price-history',
    name: 'price-history',
    component: () => import('../views/PriceHistoryView.vue'),
    meta: { title: 'Price history', access: { kinds: ['printer'] } },
  },
  {
    path: 'library',
    name: 'library',
    component: () => import('../views/LibraryView.vue'),
    meta: { title: 'Die library' },
  },
  {
    path: 'open-requests',
    name: 'open-requests',
    component: () => import('../views/MarketplaceView.vue'),
    meta: { title: 'Open requests', access: { kinds: ['die_shop'] } },
  },
  {
    path: 'notifications',
    name: 'notifications',
    component: () => import('../views/NotificationsView.vue'),
    meta: { title: 'Notifications', hidden: true },
  },
  { path: 'team', name: 'team', component: () => import('../views/TeamView.vue'), meta: { title: 'Team' } },
  {
    path: 'presses',
    name: 'presses',
    component: () => import('../views/PressesView.vue'),
    meta: { title: 'Presses', access: { kinds: ['printer'] } },
  },
];

const routes: RouteRecordRaw[] = [
  {
    path: '/sign-in',
    name: 'sign-in',
    component: () => import('../views/SignInView.vue'),
    meta: { public: true, title: 'Sign in' },
  },
  {
    path: '/accept-invitation',
    name: 'accept-invitation',
    component: () => import('../views/AcceptInvitationView.vue'),
    meta: { public: true, title: 'Accept invitation' },
  },
  { path: '/', component: () => import('../layouts/AppLayout.vue'), children: appRoutes },
  {
    path: '/:rest(.*)*',
    name: 'not-found',
    component: () => import('../views/NotFoundView.vue'),
    meta: { public: true, title: 'Not found' },
  },
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
