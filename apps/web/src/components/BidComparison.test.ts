import type { BidComparisonDto, ComparedBidDto, DieRequestDetail } from '@kerfmark/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mountWithApp, settle } from '../test/mountWithApp';
import BidComparison from './BidComparison.vue';

const award = vi.fn();
let comparison: BidComparisonDto;
vi.mock('../api/endpoints', () => ({
  bidsApi: {
    compare: vi.fn(async () => comparison),
    award: (...args: unknown[]) => award(...args),
  },
}));

const request = { id: 9, status: 'bidding_closed', allowedActions: ['award'] } as unknown as DieRequestDetail;

function row(bidId: number, shopName: string, totalCents: number, needsReason: boolean): ComparedBidDto {
  return {
    bidId,
    shopId: bidId,
    shopName,
    lines: [],
    currency: 'USD',
    totalCents,
    dieCents: totalCents,
    overLowestCents: needsReason ? 3_000 : 0,
    centsPerInch: null,
    leadDays: 5,
    promisedShipDate: '2026-12-14',
    daysLate: 0,
    validUntil: '2027-01-30',
    expired: false,
    onTimeRate: null,
    pastJobs: 0,
    revision: 1,
    needsReason,
    best: [],
  };
}

const modalOk = () => document.querySelector<HTMLButtonElement>('.ant-modal .ant-btn-primary')!;
const reasonBox = () => document.querySelector<HTMLTextAreaElement>('[data-test=award-reason]')!;

afterEach(() => {
  award.mockReset();
  document.body.innerHTML = '';
});

// The API decides whether an award needs a written reason (the pricing package's awardReason);
// the view asks for one exactly when the row says so.
describe('BidComparison', () => {
  comparison = {
    requestId: 9,
    needByDate: null,
    priceRuleIn: null,
    fairPrice: null,
    award: null,
    bids: [row(1, 'Okafor Steel Rule Dies', 97_500, false), row(2, 'Brightline Rule & Die', 100_500, true)],
  };

  it('asks why when the chosen bid is not the lowest, and sends the reason', async () => {
    const w = mountWithApp(BidComparison, { request });
    await settle();
    expect(w.find('[data-test=comparison-table]').text()).toContain('Brightline Rule & Die');
    await w.find('[data-test=award-2]').trigger('click');
    await settle();
    modalOk().click();
    await settle();
    expect(document.querySelector('[data-test=award-error]')?.textContent).toContain('write why');
    expect(award).not.toHaveBeenCalled();

    reasonBox().value = 'Ships five working days sooner.';
    reasonBox().dispatchEvent(new Event('input'));
    award.mockResolvedValue({ ...request, award: { poNumber: 'PO-2026-00001' } });
    modalOk().click();
    await settle();
    expect(award).toHaveBeenCalledWith(9, 2, 'Ships five working days sooner.');
  });

  it('awards the lowest bid without a reason', async () => {
    const w = mountWithApp(BidComparison, { request });
    await settle();
    award.mockResolvedValue({ ...request, award: { poNumber: 'PO-2026-00002' } });
    await w.find('[data-test=award-1]').trigger('click');
    await settle();
    modalOk().click();
    await settle();
    expect(award).toHaveBeenCalledWith(9, 1, undefined);
  });
});
