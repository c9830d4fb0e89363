import { describe, expect, it } from 'vitest';
import { fieldsNotFor, OrganisationProfileUpdate } from './organisationProfile';

const issuesOf = (input: unknown) =>
  OrganisationProfileUpdate.safeParse(input).error?.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));

describe('OrganisationProfileUpdate', () => {
  it('hands back only the fields named, trimmed', () => {
    expect(OrganisationProfileUpdate.parse({ paymentTerms: '  Net 30 ' })).toEqual({ paymentTerms: 'Net 30' });
    expect(OrganisationProfileUpdate.parse({ ruleHeightsIn: [0.918] })).toEqual({ ruleHeightsIn: [0.918] });
  });

  it('clears a text field given an empty box, and an e-mail given an empty string', () => {
    expect(OrganisationProfileUpdate.parse({ legalName: '  ', contactEmail: '' })).toEqual({
      legalName: null,
      contactEmail: null,
    });
  });

  it('keeps text in any script as typed', () => {
    const legalName = 'Łódź Kartonaż Sp. z o.o.';
    expect(OrganisationProfileUpdate.parse({ legalName, officeAddress: '東京都港区\n1-2-3' })).toEqual({
      legalName,
      officeAddress: '東京都港区\n1-2-3',
    });
  });

  it('refuses an empty change, each bad field with its own message', () => {
    expect(issuesOf({})).toEqual([{ path: '', message: 'Nothing to change' }]);
    expect(issuesOf({ contactEmail: 'not an address' })).toEqual([
      { path: 'contactEmail', message: 'Enter a valid e-mail address' },
    ]);
    // The two heights the trade makes cutting rule to (common practice: 0.937 in and 0.918 in).
    expect(issuesOf({ ruleHeightsIn: [0.95] })?.[0]?.path).toBe('ruleHeightsIn.0');
    expect(issuesOf({ dieKinds: ['flat', 'flat'] })).toEqual([
      { path: 'dieKinds', message: 'Name each of the die kinds once' },
    ]);
    expect(issuesOf({ maxBoardWidthIn: 0.5 })).toEqual([
      { path: 'maxBoardWidthIn', message: 'A board side is at least 1 in (25.4 mm)' },
    ]);
    expect(
      issuesOf({
        deliveryPoints: [
          { name: 'Dock 1', address: '1 Mill Lane' },
          { name: 'dock 1', address: '2 Mill Lane' },
        ],
      }),
    ).toEqual([{ path: 'deliveryPoints', message: 'Give each delivery point a name of its own' }]);
    expect(issuesOf({ deliveryPoints: [{ name: 'Dock 1', address: ' ' }] })).toEqual([
      { path: 'deliveryPoints.0.address', message: 'Enter the address' },
    ]);
  });

  it('gives a delivery point without a postcode a null one', () => {
    expect(OrganisationProfileUpdate.parse({ deliveryPoints: [{ name: 'Dock', address: '1 Mill Lane' }] })).toEqual({
      deliveryPoints: [{ name: 'Dock', address: '1 Mill Lane', postcode: null }],
    });
  });
});

describe('fieldsNotFor', () => {
  it('keeps printers to printer fields and die shops to capabilities', () => {
    expect(fieldsNotFor('printer')).toContain('dieKinds');
    expect(fieldsNotFor('printer')).not.toContain('paymentTerms');
    expect(fieldsNotFor('die_shop')).toEqual(['paymentTerms', 'paymentNetDays', 'deliveryPoints']);
  });
});
