import type { LengthUnits } from '@kerfmark/contracts';
import { useMutation, useQueryClient } from '@tanstack/vue-query';
import { message } from 'ant-design-vue';
import { computed } from 'vue';
import { meApi } from '../api/endpoints';
import { queryKeys } from '../api/queryKeys';
import { useAuthStore } from '../stores/auth';

export const lengthUnitLabels: Record<LengthUnits, string> = { in: 'Inches', mm: 'Millimetres' };

/** The user's choice of inches or millimetres, saved to their preferences and shown at once. */
export function useLengthUnits() {
  const auth = useAuthStore();
  const queryClient = useQueryClient();
  const current = computed<LengthUnits>(() => auth.me?.lengthUnits ?? 'in');
  const save = useMutation({
    mutationFn: (units: LengthUnits) => meApi.saveLengthUnits(units),
    onSuccess: (saved, units) => {
      queryClient.setQueryData(queryKeys.preferences(), saved);
      auth.setLengthUnits(units);
      message.success(`Lengths are now shown in ${lengthUnitLabels[units].toLowerCase()}`);
    },
    onError: () => message.error('Your choice was not saved. Try again.'),
  });
  const choose = (units: LengthUnits) => {
    if (units !== current.value && !save.isPending.value) save.mutate(units);
  };
  return { current, choose };
}
