export const RULE_TYPES = ['cut', 'crease', 'perf', 'kiss', 'other'] as const;
export type RuleType = (typeof RULE_TYPES)[number];
export type PricedRuleType = Exclude<RuleType, 'other'>;
export const PRICED_RULE_TYPES: readonly PricedRuleType[] = ['cut', 'crease', 'perf', 'kiss'];

/** Layer (or SVG label) name → rule type, chosen by the user; keys match case-insensitively. */
export type LayerMap = Readonly<Record<string, RuleType>>;

/**
 * Keywords in the order they are tried, as stems so "Creasing" and "Scoring" match too.
 * "kiss cut" and "perf-cut" names hold "cut" too, so kiss and perf come first; crease and
 * score before cut so "cut-score" is a crease.
 */
const KEYWORDS: ReadonlyArray<readonly [string, PricedRuleType]> = [
  ['kiss', 'kiss'],
  ['perf', 'perf'],
  ['creas', 'crease'],
  ['scor', 'crease'],
  ['cut', 'cut'],
];

/** The rule type a name says by keyword, or null when it says none. */
export function ruleTypeFromName(name: string): PricedRuleType | null {
  const lower = name.toLowerCase();
  for (const [word, type] of KEYWORDS) if (lower.includes(word)) return type;
  return null;
}

export interface RuleTypeChoice {
  layer: string;
  ruleType: RuleType;
}

export function isRuleType(value: unknown): value is RuleType {
  return typeof value === 'string' && (RULE_TYPES as readonly string[]).includes(value);
}

/**
 * Picks the rule type for an entity from its candidate names, nearest first (a DXF layer; an
 * SVG element's own labels, then its ancestors'). The user's map wins over keywords for the
 * same name; the first name that maps or says a keyword decides. With none, the rule type is
 * `other` under the first name (or `fallback`).
 */
export function createRuleTypeResolver(layerMap: LayerMap = {}) {
  const map = new Map(Object.entries(layerMap).map(([k, v]) => [k.toLowerCase(), v]));
  return (names: readonly string[], fallback = '(unnamed)'): RuleTypeChoice => {
    for (const name of names) {
      const mapped = map.get(name.toLowerCase());
      if (mapped) return { layer: name, ruleType: mapped };
      const type = ruleTypeFromName(name);
      if (type) return { layer: name, ruleType: type };
    }
    return { layer: names[0] ?? fallback, ruleType: 'other' };
  };
}

export type RuleTypeResolver = ReturnType<typeof createRuleTypeResolver>;
