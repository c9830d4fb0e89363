import type { Me } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { canAccess } from './access';

const me = (kind: Me['organisation']['kind'], role: Me['role']): Me => ({
  id: 1,
  email: 'a@b.example',
  name: 'A',
  role,
  organisation: { id: 1, name: 'Org', kind, timeZone: 'UTC' },
  lengthUnits: 'in',
  locale: 'en-US',
});

describe('canAccess', () => {
  it('opens routes without a rule to everyone', () => {
    expect(canAccess(me('die_shop', 'estimator'), undefined)).toBe(true);
  });

  it('checks the organisation kind and the role', () => {
    const presses = { kinds: ['printer' as const] };
    expect(canAccess(me('printer', 'buyer'), presses)).toBe(true);
    expect(canAccess(me('die_shop', 'admin'), presses)).toBe(false);
    const adminOnly = { roles: ['admin' as const] };
    expect(canAccess(me('printer', 'purchasing'), adminOnly)).toBe(false);
    expect(canAccess(me('die_shop', 'admin'), adminOnly)).toBe(true);
  });
});
