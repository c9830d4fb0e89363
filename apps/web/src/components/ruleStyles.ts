import type { RuleType } from '@kerfmark/dieline';

/** How each rule type is drawn: told apart by line style first, colour second (our own scheme). */
export const ruleStyles: Record<RuleType, { color: string; dash: string; label: string }> = {
  cut: { color: '#1d5c63', dash: '', label: 'Cutting rule' },
  crease: { color: '#b7791f', dash: '6 4', label: 'Creasing rule' },
  perf: { color: '#8e3b8e', dash: '8 3 2 3', label: 'Perforating rule' },
  kiss: { color: '#2f6fb0', dash: '1.5 3', label: 'Kiss cut' },
  other: { color: '#9aa5a8', dash: '3 3', label: 'Other (not priced)' },
};
