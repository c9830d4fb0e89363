import { QueryClient, VueQueryPlugin } from '@tanstack/vue-query';
import { mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia } from 'pinia';
import type { Component } from 'vue';

/** Mounts a component with what the app gives it: ant-design-vue, Pinia and a fresh query cache. */
export function mountWithApp<C extends Component>(component: C, props: Record<string, unknown>) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return mount(component as Component, {
    props,
    attachTo: document.body,
    global: { plugins: [Antd, createPinia(), [VueQueryPlugin, { queryClient }]] },
  });
}

/** Lets promises and Vue's updates settle. */
export const settle = () => new Promise((resolve) => setTimeout(resolve, 0));
