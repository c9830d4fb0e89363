import { describe, expect, it } from 'vitest';
import { errorsText, validateRelease } from '../../test/ocdsValidator';
import { ocdsRelease } from './ocdsRelease';
import type { OcdsInput } from './types';

const validate = validateRelease;

const northside = { id: 20, name: 'Northside Rule & Die' };
const lakeshore = { id: 21, name: 'Lakeshore Dies' };
const input: OcdsInput = {
  ocidPrefix: 'ocds-kerfmark',
  request: {
    id: 17,
    title: 'Cereal carton 4-up',
    description: 'Flatbed die for a 4-up cereal carton',
    status: 'awarded',
    publishedAt: new Date('2026-11-20T15:00:00Z'),
    bidDeadline: new Date('2026-12-01T23:00:00Z'),
    needByDate: '2027-01-15',
    quantity: 2,
  },
  buyer: { id: 10, name: 'Prairie Folding Cartons' },
  bids: [
    {
      id: 101,
      shop: northside,
      status: 'submitted',
      submittedAt: new Date('2026-11-25T10:00:00Z'),
      totalCents: 84500,
      currency: 'USD',
    },
    {
      id: 102,
      shop: lakeshore,
      status: 'withdrawn',
      submittedAt: new Date('2026-11-26T11:30:00Z'),
      totalCents: 79900,
      currency: 'USD',
    },
  ],
  award: {
    id: 7,
    bidId: 101,
    shop: northside,
    awardedAt: new Date('2026-12-03T16:00:00Z'),
    totalCents: 84500,
    currency: 'USD',
    reason: 'Best lead time for the need-by date',
  },
  purchaseOrder: { poNumber: 'PO-2026-0042', issuedAt: new Date('2026-12-03T16:00:05Z'), status: 'active' },
  releasedAt: new Date('2026-12-03T16:00:05Z'),
};

type Release = {
  ocid: string;
  tender: { status: string; numberOfTenderers: number };
  parties: Array<{ id: string; roles: string[] }>;
  bids: { details: Array<{ id: string; status: string; value: { amount: number; currency: string } }> };
  awards: Array<{ value: { amount: number }; relatedBids: string[] }>;
  contracts: Array<{ id: string; awardID: string; value: { amount: number } }>;
};
const release = (overrides: Partial<OcdsInput> = {}) => ocdsRelease({ ...input, ...overrides }) as unknown as Release;

describe('ocdsRelease', () => {
  it('builds a release that the OCDS 1.1.5 release schema with the bids extension accepts', () => {
    const out = ocdsRelease(input);
    expect(validate(out), errorsText(validate.errors)).toBe(true);
    expect(out).toMatchObject({
      ocid: 'ocds-kerfmark-17',
      id: 'ocds-kerfmark-17-award-7',
      tag: ['award', 'contract'],
      initiationType: 'tender',
      buyer: { id: '10', name: 'Prairie Folding Cartons' },
      tender: {
        id: '17',
        status: 'complete',
        numberOfTenderers: 2,
        tenderPeriod: { startDate: '2026-11-20T15:00:00.000Z', endDate: '2026-12-01T23:00:00.000Z' },
      },
      awards: [
        { id: '7', status: 'active', suppliers: [{ id: '20', name: 'Northside Rule & Die' }], relatedBids: ['101'] },
      ],
      contracts: [{ id: 'PO-2026-0042', awardID: '7', status: 'active', dateSigned: '2026-12-03T16:00:05.000Z' }],
    });
  });

  it('names the buyer, every tenderer, and the winner as supplier (OCDS partyRole code list)', () => {
    expect(release().parties).toEqual([
      expect.objectContaining({ id: '10', roles: ['buyer'] }),
      expect.objectContaining({ id: '20', roles: ['tenderer', 'supplier'] }),
      expect.objectContaining({ id: '21', roles: ['tenderer'] }),
    ]);
  });

  it('lists submitted bids as valid and withdrawn ones as withdrawn (bids extension bidStatus code list)', () => {
    expect(release().bids.details.map((bid) => [bid.id, bid.status])).toEqual([
      ['101', 'valid'],
      ['102', 'withdrawn'],
    ]);
  });

  it('writes amounts as decimal major units from integer minor units', () => {
    // ISO 4217 minor units: USD 2, JPY 0, BHD 3.
    const usd = release();
    expect(usd.awards[0]?.value.amount).toBe(845);
    expect(usd.contracts[0]?.value.amount).toBe(845);
    expect(usd.bids.details[1]?.value).toEqual({ amount: 799, currency: 'USD' });
    const odd = release({
      bids: [{ ...input.bids[0]!, totalCents: 84501 }],
      award: { ...input.award, totalCents: 84501 },
    });
    expect(odd.awards[0]?.value.amount).toBe(845.01);

    const jpy = release({
      bids: [{ ...input.bids[0]!, totalCents: 150000, currency: 'JPY' }],
      award: { ...input.award, totalCents: 150000, currency: 'JPY' },
    });
    expect(jpy.awards[0]?.value.amount).toBe(150000);
    expect(validate(jpy), errorsText(validate.errors)).toBe(true);

    const bhd = release({
      bids: [{ ...input.bids[0]!, totalCents: 1234567, currency: 'BHD' }],
      award: { ...input.award, totalCents: 1234567, currency: 'BHD' },
    });
    expect(bhd.awards[0]?.value.amount).toBe(1234.567);
  });

  it('maps our request statuses onto the OCDS tender status code list', () => {
    const cases: Array<[string, string]> = [
      ['draft', 'planning'],
      ['open', 'active'],
      ['bidding_closed', 'complete'],
      ['awarded', 'complete'],
      ['in_production', 'complete'],
      ['shipped', 'complete'],
      ['received', 'complete'],
      ['cancelled', 'cancelled'],
    ];
    for (const [status, expected] of cases) {
      const out = ocdsRelease({ ...input, request: { ...input.request, status } });
      expect((out as unknown as Release).tender.status, status).toBe(expected);
      expect(validate(out), errorsText(validate.errors)).toBe(true);
    }
    expect(() => ocdsRelease({ ...input, request: { ...input.request, status: 'paused' } })).toThrow(
      'Unknown request status "paused"',
    );
  });

  it('proves the validator can fail: no ocid, or a bid status off the code list', () => {
    const { ocid: _ocid, ...withoutOcid } = ocdsRelease(input);
    expect(validate(withoutOcid)).toBe(false);
    expect(validate.errors).toEqual(
      expect.arrayContaining([expect.objectContaining({ params: { missingProperty: 'ocid' } })]),
    );

    // Only the merged bids extension knows the Bid definition, so this also proves the merge took.
    const bad = structuredClone(ocdsRelease(input)) as unknown as Release;
    bad.bids.details[0]!.status = 'accepted';
    expect(validate(bad)).toBe(false);
    expect(errorsText(validate.errors)).toContain('/bids/details/0/status');
  });

  it('refuses an award whose bid is missing, withdrawn or from another shop', () => {
    expect(() => ocdsRelease({ ...input, award: { ...input.award, bidId: 999 } })).toThrow('not among the request');
    expect(() => ocdsRelease({ ...input, award: { ...input.award, bidId: 102, shop: lakeshore } })).toThrow(
      'was withdrawn',
    );
    expect(() => ocdsRelease({ ...input, award: { ...input.award, shop: lakeshore } })).toThrow('another die shop');
    expect(() => ocdsRelease({ ...input, award: { ...input.award, currency: 'US' } })).toThrow(
      'Not an ISO 4217 currency code: "US"',
    );
  });
});
