import { afterEach, describe, expect, it, vi } from 'vitest';
import { nextTick } from 'vue';
import { useServerTable } from './useServerTable';

afterEach(() => vi.useRealTimers());

describe('useServerTable', () => {
  it('sends the search 300 ms after the last key and goes back to the first page', async () => {
    vi.useFakeTimers();
    const table = useServerTable('bidDeadline');
    table.page.value = 3;
    table.search.value = 'car';
    await nextTick();
    vi.advanceTimersByTime(200);
    table.search.value = 'carton';
    await nextTick();
    vi.advanceTimersByTime(299);
    expect(table.q.value).toBe('');
    vi.advanceTimersByTime(1);
    expect(table.q.value).toBe('carton');
    expect(table.page.value).toBe(1);
  });

  it('turns the table’s sorter into the API’s sort, and back to the default when cleared', () => {
    const table = useServerTable('bidDeadline');
    table.onTableChange({ current: 2 }, {}, { columnKey: 'distance', order: 'descend' });
    expect(table.sort.value).toBe('-distance');
    expect(table.page.value).toBe(2);
    expect(table.sortable('distance').sortOrder).toBe('descend');
    table.onTableChange({ current: 1 }, {}, { columnKey: 'distance', order: null });
    expect(table.sort.value).toBe('bidDeadline');
    expect(table.sortable('distance').sortOrder).toBeNull();
  });

  it('goes back to the first page when the order changes, from a header or the phone’s sort list', async () => {
    const table = useServerTable('bidDeadline');
    table.page.value = 4;
    table.sort.value = '-ruleLength';
    await nextTick();
    expect(table.page.value).toBe(1);
  });
});
