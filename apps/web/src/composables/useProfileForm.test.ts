import type { DieShopProfileDto, PrinterProfileDto } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { profileChanges, profileToForm } from './useProfileForm';

const printer: PrinterProfileDto = {
  organisationId: 1,
  kind: 'printer',
  name: 'Larkspur',
  legalName: 'Larkspur Press & Carton Co.',
  officeAddress: '2150 Thistlecombe Row',
  postcode: '60614',
  contactEmail: null,
  editable: true,
  paymentTerms: 'Net 30',
  paymentNetDays: null,
  deliveryPoints: [{ name: 'Dock 2', address: '2150 Thistlecombe Row', postcode: null }],
};
const shop: DieShopProfileDto = {
  organisationId: 2,
  kind: 'die_shop',
  name: 'Brightline',
  legalName: null,
  officeAddress: null,
  postcode: null,
  contactEmail: null,
  editable: true,
  dieKinds: ['flat'],
  maxBoardWidthIn: 40,
  maxBoardLengthIn: 60,
  ruleHeightsIn: [0.937, 0.918],
  makesCounters: null,
  fitsEjectionRubber: true,
  laserCutBoards: true,
};

describe('profileChanges', () => {
  it('names nothing when nothing was changed', () => {
    expect(profileChanges(printer, profileToForm(printer))).toEqual({});
    expect(profileChanges(shop, profileToForm(shop))).toEqual({});
  });

  it('names only the fields changed, text trimmed and an emptied box as null', () => {
    const form = { ...profileToForm(printer), paymentTerms: ' Net 45 ', legalName: '   ' };
    expect(profileChanges(printer, form)).toEqual({ paymentTerms: 'Net 45', legalName: null });
  });

  it('sends the whole list of delivery points when one of them changed', () => {
    const form = profileToForm(printer);
    form.deliveryPoints.push({ name: 'Annex', address: '41 Brackenhollow Court', postcode: '' });
    expect(profileChanges(printer, form)).toEqual({
      deliveryPoints: [
        { name: 'Dock 2', address: '2150 Thistlecombe Row', postcode: null },
        { name: 'Annex', address: '41 Brackenhollow Court', postcode: null },
      ],
    });
  });

  it('sees no change in ticking the same rule heights in another order, and sends a capability once stated', () => {
    const form = { ...profileToForm(shop), ruleHeightsIn: [0.918, 0.937] as const, makesCounters: false };
    expect(profileChanges(shop, { ...form, ruleHeightsIn: [...form.ruleHeightsIn] })).toEqual({ makesCounters: false });
  });

  it('sends an emptied board size as null', () => {
    // ant-design-vue's number input gives null when its box is emptied.
    const form = { ...profileToForm(shop), maxBoardWidthIn: null as unknown as undefined, maxBoardLengthIn: undefined };
    expect(profileChanges(shop, form)).toEqual({ maxBoardWidthIn: null, maxBoardLengthIn: null });
  });

  it('never sends the other kind’s fields', () => {
    const form = { ...profileToForm(shop), paymentTerms: 'Net 30' };
    expect(profileChanges(shop, form)).toEqual({});
  });
});
