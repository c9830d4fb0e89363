import type { DisplayLocale, LengthUnits } from '@kerfmark/contracts';
import { useMutation, useQueryClient } from '@tanstack/vue-query';
import { message } from 'ant-design-vue';
import { computed } from 'vue';
import { meApi } from '../api/endpoints';
import { queryKeys } from '../api/queryKeys';
import { useAuthStore } from '../stores/auth';

export const lengthUnitLabels: Record<LengthUnits, string> = { in: 'Inches', mm: 'Millimetres' };
export const localeLabels: Record<DisplayLocale, string> = {
  'en-US': 'US English (Dec 5, 2026)',
  'en-GB': 'British English (5 Dec 2026)',
};

type Change = { lengthUnits: LengthUnits } | { locale: DisplayLocale };

/** The user's choices of inches or millimetres and of locale, saved to their preferences and shown at once. */
export function useDisplayChoices() {
  const auth = useAuthStore();
  const queryClient = useQueryClient();
  const units = computed<LengthUnits>(() => auth.me?.lengthUnits ?? 'in');
  const locale = computed<DisplayLocale>(() => auth.me?.locale ?? 'en-US');
  const save = useMutation({
    mutationFn: (change: Change) => meApi.saveDisplay(change),
    onSuccess: (saved, change) => {
      queryClient.setQueryData(queryKeys.preferences(), saved);
      auth.setDisplay(change);
      message.success(
        'lengthUnits' in change
          ? `Lengths are now shown in ${lengthUnitLabels[change.lengthUnits].toLowerCase()}`
          : `Dates and numbers are now written in ${localeLabels[change.locale]}`,
      );
    },
    onError: () => message.error('Your choice was not saved. Try again.'),
  });
  const chooseUnits = (choice: LengthUnits) => {
    if (choice !== units.value && !save.isPending.value) save.mutate({ lengthUnits: choice });
  };
  const chooseLocale = (choice: DisplayLocale) => {
    if (choice !== locale.value && !save.isPending.value) save.mutate({ locale: choice });
  };
  return { units, locale, chooseUnits, chooseLocale };
}
