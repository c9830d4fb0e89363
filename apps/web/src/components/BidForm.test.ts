import type { BidDto, DieRequestDetail } from '@kerfmark/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mountWithApp, settle } from '../test/mountWithApp';
import BidForm from './BidForm.vue';

const revise = vi.fn();
vi.mock('../api/endpoints', () => ({
  bidsApi: { estimateAid: vi.fn(async () => []), revise: (...args: unknown[]) => revise(...args), submit: vi.fn() },
}));

const request = {
  id: 7,
  counterWanted: false,
  ejectionRubberWanted: false,
  bidDeadline: '2026-12-20T17:00:00.000Z',
  metrics: null,
} as unknown as DieRequestDetail;

function bidIn(currency: string, amounts: number[]): BidDto {
  return {
    id: 3,
    currency,
    leadDays: 6,
    validUntil: '2027-01-20',
    notes: null,
    lines: amounts.map((amountCents, i) => ({ kind: i === 0 ? 'die' : 'shipping', description: '', amountCents })),
  } as unknown as BidDto;
}

const amount = (w: ReturnType<typeof mountWithApp>, i: number) =>
  w.find<HTMLInputElement>(`[data-test=bid-amount-${i}] input, input[data-test=bid-amount-${i}]`);

afterEach(() => {
  revise.mockReset();
  document.body.innerHTML = '';
});

// ISO 4217 minor units: the yen has none, the US dollar two, the Kuwaiti dinar three.
describe('BidForm', () => {
  it('shows a yen bid being revised in whole yen, and sends whole yen back', async () => {
    const w = mountWithApp(BidForm, { request, bid: bidIn('JPY', [150_000, 1_500]) });
    await settle();
    expect(amount(w, 0).element.value).toBe('150000');
    expect(amount(w, 1).element.value).toBe('1500');
    expect(w.find('[data-test=bid-total]').text()).toBe('¥151,500');
    revise.mockResolvedValue({
      ...bidIn('JPY', [140_000, 1_500]),
      totalCents: 141_500,
      promisedShipDate: '2027-01-05',
    });
    await amount(w, 0).setValue('140000');
    expect(w.find('[data-test=bid-total]').text()).toBe('¥141,500');
    await w.find('[data-test=bid-submit]').trigger('click');
    await settle();
    expect(revise).toHaveBeenCalledOnce();
    const [, input] = revise.mock.calls[0] as [number, { lines: Array<{ amountCents: number }>; currency: string }];
    expect(input.currency).toBe('JPY');
    expect(input.lines.map((l) => l.amountCents)).toEqual([140_000, 1_500]);
  });

  it('shows dollars with cents, and refuses a fraction of a yen before sending', async () => {
    const usd = mountWithApp(BidForm, { request, bid: bidIn('USD', [84_550, 3_500]) });
    await settle();
    expect(amount(usd, 0).element.value).toBe('845.50');
    expect(usd.find('[data-test=bid-total]').text()).toBe('$880.50');
    usd.unmount();

    const yen = mountWithApp(BidForm, { request, bid: bidIn('JPY', [150_000, 1_500]) });
    await settle();
    await amount(yen, 0).setValue('1500.50');
    expect(yen.find('[data-test=bid-total]').text()).toBe('—');
    await yen.find('[data-test=bid-submit]').trigger('click');
    await settle();
    expect(revise).not.toHaveBeenCalled();
    expect(yen.find('[data-test=bid-error]').text()).toContain('like 845');
    expect(yen.find('[data-test=bid-error]').text()).not.toContain('845.00');
  });
});
