import type { TablePaginationConfig } from 'ant-design-vue';
import { ref, watch } from 'vue';

/**
 * The state of a table that the server searches, sorts and pages: the search box (sent 300 ms
 * after the last key), the page, and the sort as the API names it (`key` or `-key`).
 */
export function useServerTable(defaultSort: string) {
  const search = ref('');
  const q = ref('');
  const page = ref(1);
  const sort = ref(defaultSort);
  let timer: ReturnType<typeof setTimeout> | undefined;
  watch(search, (value) => {
    clearTimeout(timer);
    timer = setTimeout(() => {
      q.value = value;
      page.value = 1;
    }, 300);
  });

  // A new order starts again from its first page (a column header or the phone's sort list).
  watch(sort, () => (page.value = 1));

  /** A column's sorter props, showing the current sort. */
  const sortable = (key: string) => ({
    sorter: true,
    sortOrder: sort.value === key ? ('ascend' as const) : sort.value === `-${key}` ? ('descend' as const) : null,
  });

  function onTableChange(pagination: TablePaginationConfig, _filters: unknown, sorter: unknown) {
    const s = sorter as { columnKey?: string; order?: 'ascend' | 'descend' | null };
    sort.value = s.order && s.columnKey ? `${s.order === 'descend' ? '-' : ''}${s.columnKey}` : defaultSort;
    page.value = pagination.current ?? 1;
  }

  return { search, q, page, sort, sortable, onTableChange };
}
