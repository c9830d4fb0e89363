import type { Me } from '@kerfmark/contracts';
import { createPinia, setActivePinia } from 'pinia';
import { describe, expect, it } from 'vitest';
import { useAuthStore } from '../stores/auth';
import { useNavigation } from './useNavigation';

const me = (kind: Me['organisation']['kind'], role: Me['role']): Me => ({
  id: 1,
  email: 'a@b.example',
  name: 'A',
  role,
  organisation: { id: 1, name: 'Org', kind, timeZone: 'UTC' },
  lengthUnits: 'in',
  locale: 'en-US',
});

const listed = (who: Me) => {
  setActivePinia(createPinia());
  useAuthStore().me = who;
  return useNavigation().value.map((item) => item.name);
};

describe('useNavigation', () => {
  it('lists the organisation profile for admins of either kind only', () => {
    expect(listed(me('printer', 'admin'))).toContain('profile');
    expect(listed(me('die_shop', 'admin'))).toContain('profile');
    expect(listed(me('printer', 'buyer'))).not.toContain('profile');
    expect(listed(me('die_shop', 'estimator'))).not.toContain('profile');
  });

  it('still lists the routes of the reader’s kind', () => {
    expect(listed(me('printer', 'buyer'))).toContain('presses');
    expect(listed(me('die_shop', 'estimator'))).not.toContain('presses');
  });
});
