// The rule types and their names, apart from the schemas in requests.ts: the web app shows these on
// pages whose first load should not carry zod.
export const ruleTypes = ['cut', 'crease', 'perf', 'kiss'] as const;
export const ruleTypeLabels: Record<(typeof ruleTypes)[number] | 'other', string> = {
  cut: 'Cutting rule',
  crease: 'Creasing rule',
  perf: 'Perforating rule',
  kiss: 'Kiss cut',
  other: 'Other (not priced)',
};
