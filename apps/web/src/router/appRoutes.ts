import type { RouteRecordRaw } from 'vue-router';
import type { Access } from './access';

/** The signed-in app's routes: each view, who may open it, and its title in the navigation. */
declare module 'vue-router' {
  interface RouteMeta {
    public?: boolean;
    access?: Access;
    title?: string;
    /** Not listed in the navigation (reached from another page). */
    hidden?: boolean;
    /** Listed in the navigation only for these, though open to everyone `access` lets in. */
    nav?: Access;
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
    component: () => import('../views/OpenRequestsView.vue'),
    meta: { title: 'Open requests', access: { kinds: ['die_shop'] } },
  },
  {
    path: 'notifications',
    name: 'notifications',
    component: () => import('../views/NotificationsView.vue'),
    meta: { title: 'Notifications', hidden: true },
  },
  {
    path: 'rate-card',
    name: 'rate-card',
    component: () => import('../views/RateCardView.vue'),
    meta: { title: 'Rate card', access: { kinds: ['die_shop'] } },
  },
  {
    path: 'holidays',
    name: 'holidays',
    component: () => import('../views/HolidaysView.vue'),
    meta: { title: 'Holidays', access: { kinds: ['die_shop'] } },
  },
  { path: 'team', name: 'team', component: () => import('../views/TeamView.vue'), meta: { title: 'Team' } },
  {
    path: 'presses',
    name: 'presses',
    component: () => import('../views/PressesView.vue'),
    meta: { title: 'Presses', access: { kinds: ['printer'] } },
  },
  {
    // Every member reads the profile (through the organisation's name in the header); admins edit it.
    path: 'profile',
    name: 'profile',
    component: () => import('../views/ProfileView.vue'),
    meta: { title: 'Organisation profile', nav: { roles: ['admin'] } },
  },
];
