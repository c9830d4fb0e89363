import type { DieShopChoice, DieShopChoices } from '@kerfmark/contracts';
import { NOTHING_STATED } from '@kerfmark/contracts';
import { flushPromises } from '@vue/test-utils';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h } from 'vue';
import { useRequestDraft, type RequestForm } from '../../composables/useRequestDraft';
import { mountWithApp, settle } from '../../test/mountWithApp';
import InvitedShopsPicker from './InvitedShopsPicker.vue';

const dieShops = vi.fn<(query: Record<string, unknown>) => Promise<DieShopChoices>>();
vi.mock('../../api/endpoints', () => ({ requestsApi: { dieShops: (q: Record<string, unknown>) => dieShops(q) } }));

const shop = (id: number, name: string, over: Partial<DieShopChoice> = {}): DieShopChoice => ({
  id,
  name,
  postcode: null,
  miles: null,
  capabilities: { ...NOTHING_STATED, laserCutBoards: null },
  onTimeRate: null,
  shipped: 0,
  jobsWithUs: 0,
  fit: { fits: true, misses: [], unstated: [] },
  ...over,
});

const needs = {
  dieKind: 'rotary' as const,
  board: null,
  cuttingRuleHeightIn: 0.918,
  counterWanted: true,
  ejectionRubberWanted: false,
};
const shops = [
  shop(1, 'Far Rule Co', { miles: 700, onTimeRate: 0.75, shipped: 4, jobsWithUs: 2 }),
  shop(2, 'Near Rule Co', { miles: 12, fit: { fits: true, misses: [], unstated: ['counters'] } }),
  shop(3, 'Flat Only Dies', { miles: 3, fit: { fits: false, misses: ['makes no rotary dies'], unstated: [] } }),
];

let form: RequestForm;
const Host = defineComponent({
  setup() {
    form = useRequestDraft();
    form.pressId = 7;
    form.counterWanted = true;
    form.ejectionRubberWanted = false;
    return () => h(InvitedShopsPicker, { requestId: 42 });
  },
});

async function mountPicker() {
  dieShops.mockResolvedValue({ needs, shops });
  const w = mountWithApp(Host, {});
  await flushPromises();
  await settle();
  return w;
}
const names = (w: Awaited<ReturnType<typeof mountPicker>>) =>
  w.findAll('[data-test=shop-choice] .name').map((n) => n.text());

afterEach(() => {
  dieShops.mockReset();
  document.body.innerHTML = '';
});

describe('InvitedShopsPicker', () => {
  it('asks for the shops against the die as the form has it', async () => {
    await mountPicker();
    expect(dieShops).toHaveBeenCalledWith(
      expect.objectContaining({ pressId: 7, requestId: 42, counterWanted: true, ejectionRubberWanted: false }),
    );
  });

  it('lists those that can make the die, nearest first, and says what each has and has not said', async () => {
    const w = await mountPicker();
    expect(names(w)).toEqual(['Near Rule Co', 'Far Rule Co']);
    expect(w.text()).toContain('Checked against a rotary die, 0.918 in cutting rule, a counter.');
    expect(w.text()).toContain('The die board is checked once the dieline is measured.');
    expect(w.text()).toContain('12 mi away · No dies shipped yet · No jobs with us yet');
    expect(w.text()).toContain('Has not said: counters');
    expect(w.text()).toContain('700 mi away · 75% on time of 4 shipped · 2 jobs with us');
  });

  it('shows the shops that cannot make it only when asked, with the reason', async () => {
    const w = await mountPicker();
    expect(w.text()).not.toContain('Flat Only Dies');
    await w.find('input[data-test=show-all-shops], [data-test=show-all-shops] input').setValue(true);
    await settle();
    expect(names(w)).toEqual(['Near Rule Co', 'Far Rule Co', 'Flat Only Dies']);
    expect(w.text()).toContain('Cannot make this die: makes no rotary dies');
  });

  it('finds a shop by name, and keeps a ticked shop in sight', async () => {
    const w = await mountPicker();
    await w.findAll('[data-test=shop-choice] input')[0]!.setValue(true); // Near Rule Co
    await w.find('input[data-test=find-shop], [data-test=find-shop] input').setValue('far');
    await settle();
    expect(names(w)).toEqual(['Near Rule Co', 'Far Rule Co']);
    await w.find('input[data-test=find-shop], [data-test=find-shop] input').setValue('flat');
    await settle();
    expect(names(w)).toEqual(['Near Rule Co']);
  });

  it('invites the shops ticked', async () => {
    const w = await mountPicker();
    await w.findAll('[data-test=shop-choice] input')[1]!.setValue(true);
    await settle();
    expect(form.invitedShopIds).toEqual([1]);
  });
});
