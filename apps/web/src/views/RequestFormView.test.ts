import { QueryClient, VueQueryPlugin } from '@tanstack/vue-query';
import { flushPromises, mount } from '@vue/test-utils';
import Antd from 'ant-design-vue';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import { ApiRequestError } from '../api/client';
import RequestFormView from './RequestFormView.vue';

const create = vi.fn();
vi.mock('../api/endpoints', () => ({
  pressesApi: { list: vi.fn(async () => []) },
  requestsApi: {
    dieShops: vi.fn(async () => ({ needs: null, shops: [] })),
    get: vi.fn(),
    create: (...args: unknown[]) => create(...args),
    update: vi.fn(),
    publish: vi.fn(),
  },
}));

async function mountForm() {
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/requests/new', name: 'request-new', component: RequestFormView },
      { path: '/requests/:id/edit', name: 'request-edit', component: RequestFormView },
      { path: '/requests/:id', name: 'request', component: { template: '<div />' } },
    ],
  });
  await router.push('/requests/new');
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const wrapper = mount(RequestFormView, {
    attachTo: document.body,
    global: { plugins: [Antd, createPinia(), router, [VueQueryPlugin, { queryClient }]] },
  });
  await flushPromises();
  return wrapper;
}

const visible = (w: Awaited<ReturnType<typeof mountForm>>, testId: string) =>
  (w.find(`[data-test=${testId}]`).element as HTMLElement).closest<HTMLElement>('[style*="display: none"]') === null;
const settle = async () => {
  await flushPromises();
  await new Promise((resolve) => setTimeout(resolve, 20));
  await flushPromises();
};

afterEach(() => {
  create.mockReset();
  document.body.innerHTML = '';
});

describe('RequestFormView', () => {
  it('keeps the first step until it is complete, then moves on', async () => {
    const w = await mountForm();
    expect(visible(w, 'req-title')).toBe(true);
    await w.find('[data-test=next]').trigger('click');
    await settle();
    expect(w.text()).toContain('Give the request a title');
    expect(visible(w, 'req-title')).toBe(true);

    await w.find('input[data-test=req-title]').setValue('Tuck-end carton, 4 up');
    await w.find('[data-test=next]').trigger('click');
    await settle();
    expect(visible(w, 'req-postcode')).toBe(true);
    expect(visible(w, 'req-title')).toBe(false);
  });

  it('takes the API’s field message back to the step that holds the field', async () => {
    const w = await mountForm();
    await w.find('input[data-test=req-title]').setValue('Tuck-end carton, 4 up');
    await w.find('[data-test=next]').trigger('click');
    await settle();
    create.mockRejectedValue(
      new ApiRequestError(400, 'invalid', 'Check the fields marked', { stockName: 'Name the stock' }),
    );
    await w.find('[data-test=next]').trigger('click');
    await settle();
    expect(create).toHaveBeenCalledOnce();
    expect(visible(w, 'req-stock')).toBe(true);
    expect(w.text()).toContain('Name the stock');
  });
});
