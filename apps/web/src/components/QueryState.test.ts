import { mount } from '@vue/test-utils';
import { describe, expect, it, vi } from 'vitest';
import { ApiRequestError } from '../api/client';
import QueryState from './QueryState.vue';

const stubs = {
  'a-skeleton': { template: '<div class="skeleton" />' },
  'a-result': {
    props: ['title', 'subTitle'],
    template: '<div class="result">{{ title }}: {{ subTitle }}<slot name="extra" /></div>',
  },
  'a-empty': { props: ['description'], template: '<div class="empty">{{ description }}</div>' },
  'a-button': { template: '<button><slot /></button>' },
};

describe('QueryState', () => {
  it('shows loading, then the error with a retry, then empty, then the content', async () => {
    const wrapper = mount(QueryState, {
      props: { loading: true, error: null },
      slots: { default: '<p>content</p>' },
      global: { stubs },
    });
    expect(wrapper.find('.skeleton').exists()).toBe(true);

    await wrapper.setProps({
      loading: false,
      error: new ApiRequestError(503, 'service_unavailable', 'Kerfmark is briefly unavailable.'),
    });
    // The error's component loads when first needed.
    await vi.waitFor(() => expect(wrapper.text()).toContain('Kerfmark is briefly unavailable.'));
    await wrapper.find('button').trigger('click');
    expect(wrapper.emitted('retry')).toHaveLength(1);

    await wrapper.setProps({ error: null, empty: true, emptyText: 'No presses yet' });
    expect(wrapper.find('.empty').text()).toBe('No presses yet');

    await wrapper.setProps({ empty: false });
    expect(wrapper.html()).toContain('<p>content</p>');
  });
});
