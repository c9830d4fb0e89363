import type { Complexity } from '@kerfmark/dieline';
import type { RuleType } from '@kerfmark/contracts';
import type { Dayjs } from 'dayjs';
import { computed, reactive, ref, watch } from 'vue';

/** The price history's filters as the form holds them, the page, and the query the API reads. */
export function usePriceHistoryFilters() {
  const filters = reactive<{
    dates?: [Dayjs, Dayjs];
    complexity?: Complexity;
    ruleType?: RuleType;
    shop?: string;
    minIn?: number;
    maxIn?: number;
  }>({});
  const page = ref(1);
  // A new filter starts again from the first page.
  watch(filters, () => (page.value = 1));
  const query = computed(() => ({
    from: filters.dates?.[0]?.format('YYYY-MM-DD'),
    to: filters.dates?.[1]?.format('YYYY-MM-DD'),
    complexity: filters.complexity,
    ruleType: filters.ruleType,
    shop: filters.shop,
    minIn: filters.minIn,
    maxIn: filters.maxIn,
  }));
  return { filters, page, query };
}
