import type { DieShopProfileDto, PrinterProfileDto } from '@kerfmark/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mountWithApp, settle } from '../test/mountWithApp';
import ProfileView from './ProfileView.vue';

const profile = vi.fn();
const updateProfile = vi.fn();
vi.mock('../api/endpoints', () => ({
  organisationApi: {
    profile: () => profile(),
    updateProfile: (...args: unknown[]) => updateProfile(...args),
  },
}));

const printer: PrinterProfileDto = {
  organisationId: 1,
  kind: 'printer',
  name: 'Larkspur Press & Carton',
  legalName: 'Łódź Kartonaż Sp. z o.o.',
  officeAddress: 'ul. Wymyślona 12\nŁódź',
  postcode: '90-001',
  contactEmail: 'biuro@lodz.example',
  editable: true,
  paymentTerms: 'Net 30',
  paymentNetDays: null,
  deliveryPoints: [{ name: 'Dock 2', address: '2150 Thistlecombe Row', postcode: '60614' }],
};
const shop: DieShopProfileDto = {
  organisationId: 2,
  kind: 'die_shop',
  name: 'Brightline Rule & Die',
  legalName: '東京抜型製作所',
  officeAddress: null,
  postcode: null,
  contactEmail: null,
  editable: false,
  dieKinds: ['flat', 'rotary'],
  maxBoardWidthIn: 40,
  maxBoardLengthIn: 60,
  ruleHeightsIn: [0.937],
  makesCounters: true,
  fitsEjectionRubber: null,
  laserCutBoards: false,
};

afterEach(() => {
  profile.mockReset();
  updateProfile.mockReset();
  document.body.innerHTML = '';
});

describe('ProfileView', () => {
  it('lets an admin change the payment terms, and sends only that field', async () => {
    profile.mockResolvedValue(printer);
    updateProfile.mockResolvedValue({ ...printer, paymentTerms: 'Net 45' });
    const w = mountWithApp(ProfileView, {});
    await settle();
    await settle();
    const legal = w.find<HTMLInputElement>('input[data-test=profile-legal-name]');
    expect(legal.element.value).toBe('Łódź Kartonaż Sp. z o.o.');
    expect(w.find<HTMLInputElement>('input[data-test=delivery-point-name-0]').element.value).toBe('Dock 2');
    expect(w.find('[data-test=profile-save]').attributes('disabled')).toBeDefined();

    await w.find('[data-test=profile-payment-terms] input').setValue('Net 45');
    await w.find('[data-test=profile-form]').trigger('submit');
    await settle();
    await settle();
    expect(updateProfile).toHaveBeenCalledWith({ paymentTerms: 'Net 45' });
  });

  it('shows a member the profile read-only, capabilities in words and inches with millimetres', async () => {
    profile.mockResolvedValue(shop);
    const w = mountWithApp(ProfileView, {});
    await settle();
    await settle();
    expect(w.find('[data-test=profile-form]').exists()).toBe(false);
    expect(w.find('[data-test=profile-read-only]').exists()).toBe(true);
    expect(w.find('[data-test=profile-details]').text()).toContain('東京抜型製作所');
    const capabilities = w.find('[data-test=profile-capabilities]').text();
    expect(capabilities).toContain('Flat, Rotary');
    // 40 in × 25.4 = 1,016 mm and 60 in = 1,524 mm (the international inch, exactly 25.4 mm).
    expect(capabilities).toContain('40.00 × 60.00 in (1,016 × 1,524 mm)');
    expect(capabilities).toContain('0.937 in');
    expect(capabilities).toContain('Not stated');
  });
});
