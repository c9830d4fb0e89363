import type { RouteRecordRaw } from 'vue-router';

/** The pages open without signing in; the last, not found, catches every other path. */
export const publicRoutes: RouteRecordRaw[] = [
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
  {
    path: '/:rest(.*)*',
    name: 'not-found',
    component: () => import('../views/NotFoundView.vue'),
    meta: { public: true, title: 'Not found' },
  },
];
