import type { DieRequestDetail } from '@kerfmark/contracts';
import { useQuery, useQueryClient } from '@tanstack/vue-query';
import { computed, toValue, type MaybeRefOrGetter } from 'vue';
import { requestsApi } from '../api/endpoints';
import { queryKeys } from '../api/queryKeys';

/** While a dieline is being measured, the request is read again this often (ms). */
export const ANALYSIS_POLL_MS = 1500;

/** Whether any of the request's files is still waiting for, or in, its analysis. */
export function analysing(request: DieRequestDetail | undefined): boolean {
  return Boolean(request?.files.some((f) => f.analysisStatus === 'pending' || f.analysisStatus === 'analysing'));
}

/**
 * One die request, read once and shared by every component that shows it; read again every
 * ANALYSIS_POLL_MS while a dieline is being measured. `store` puts the API's answer to a change in
 * the cache and refreshes the lists.
 */
export function useRequest(id: MaybeRefOrGetter<number | null>) {
  const queryClient = useQueryClient();
  const key = computed(() => toValue(id));
  const query = useQuery({
    queryKey: queryKeys.request(key),
    queryFn: () => requestsApi.get(key.value!),
    enabled: computed(() => key.value !== null),
    refetchInterval: (q) => (analysing(q.state.data as DieRequestDetail | undefined) ? ANALYSIS_POLL_MS : false),
  });
  function store(updated: DieRequestDetail) {
    queryClient.setQueryData(queryKeys.request(updated.id), updated);
    return queryClient.invalidateQueries({ queryKey: queryKeys.requests() });
  }
  return { ...query, request: computed(() => query.data.value), store };
}
