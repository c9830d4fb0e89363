import { describe, expect, it } from 'vitest';
import { createRuleTypeResolver, ruleTypeFromName } from './ruleType';

describe('rule type from names', () => {
  it('reads the keywords case-insensitively', () => {
    expect(ruleTypeFromName('CUT')).toBe('cut');
    expect(ruleTypeFromName('Die cutting')).toBe('cut');
    expect(ruleTypeFromName('crease-2pt')).toBe('crease');
    expect(ruleTypeFromName('SCORE')).toBe('crease');
    expect(ruleTypeFromName('Creasing')).toBe('crease');
    expect(ruleTypeFromName('Scoring rules')).toBe('crease');
    expect(ruleTypeFromName('Perforation')).toBe('perf');
    expect(ruleTypeFromName('kiss')).toBe('kiss');
    expect(ruleTypeFromName('Dimensions')).toBeNull();
  });

  // "kiss cut" and "perf-cut" hold "cut" too: kiss and perf win over cut; crease/score win over cut.
  it('puts kiss and perf before cut', () => {
    expect(ruleTypeFromName('Kiss Cut')).toBe('kiss');
    expect(ruleTypeFromName('KISSCUT')).toBe('kiss');
    expect(ruleTypeFromName('perf-cut')).toBe('perf');
    expect(ruleTypeFromName('cut-score')).toBe('crease');
  });

  it('lets the map override keywords, matching names case-insensitively', () => {
    const resolve = createRuleTypeResolver({ 'layer 7': 'perf', CUT: 'other' });
    expect(resolve(['LAYER 7'])).toEqual({ layer: 'LAYER 7', ruleType: 'perf' });
    expect(resolve(['cut'])).toEqual({ layer: 'cut', ruleType: 'other' });
    expect(resolve(['Crease'])).toEqual({ layer: 'Crease', ruleType: 'crease' });
  });

  it('takes the nearest name that says a rule type, else other under the nearest name', () => {
    const resolve = createRuleTypeResolver();
    expect(resolve(['path12', 'Crease', 'Cut'])).toEqual({ layer: 'Crease', ruleType: 'crease' });
    expect(resolve(['path12', 'artwork'])).toEqual({ layer: 'path12', ruleType: 'other' });
    expect(resolve([])).toEqual({ layer: '(unnamed)', ruleType: 'other' });
  });
});
