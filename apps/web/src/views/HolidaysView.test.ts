import type { HolidayDto, HolidayYearDto, Me } from '@kerfmark/contracts';
import { flushPromises } from '@vue/test-utils';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { useAuthStore } from '../stores/auth';
import { mountWithApp } from '../test/mountWithApp';
import HolidaysView from './HolidaysView.vue';

const loadPublic = vi.fn();
const remove = vi.fn();
const holiday = (id: number, date: string, name: string, over: Partial<HolidayDto> = {}): HolidayDto => ({
  id,
  date,
  name,
  source: 'public',
  country: 'US',
  region: null,
  past: false,
  ...over,
});
const calendar: HolidayYearDto = {
  year: 2027,
  today: '2027-01-10',
  holidays: [
    holiday(1, '2027-01-01', "New Year's Day", { past: true }),
    holiday(2, '2027-07-04', 'Independence Day'),
    holiday(3, '2027-07-05', 'Independence Day (substitute day)'),
    holiday(4, '2027-03-12', 'Stocktaking day', { source: 'own', country: null }),
  ].sort((a, b) => (a.date < b.date ? -1 : 1)),
  keptOpen: [holiday(5, '2027-10-11', 'Columbus Day')],
  lastLoaded: { country: 'US', region: 'IL' },
};
vi.mock('../api/endpoints', () => ({
  holidaysApi: {
    year: vi.fn(async () => calendar),
    places: vi.fn(async () => ({
      countries: [{ code: 'US', name: 'United States of America' }],
      country: 'US',
      regions: [{ code: 'IL', name: 'Illinois' }],
    })),
    add: vi.fn(),
    loadPublic: (...args: unknown[]) => loadPublic(...args),
    remove: (...args: unknown[]) => remove(...args),
  },
}));

async function mountAs(role: 'admin' | 'estimator') {
  const wrapper = mountWithApp(HolidaysView, {});
  useAuthStore().me = {
    id: 1,
    role,
    organisation: { id: 2, name: 'Test Die Shop', kind: 'die_shop', timeZone: 'America/Chicago' },
  } as unknown as Me;
  await flushPromises();
  await flushPromises();
  return wrapper;
}

afterEach(() => {
  loadPublic.mockReset();
  remove.mockReset();
  document.body.innerHTML = '';
});

describe('HolidaysView', () => {
  it('shows the year by month, in date order, the weekend days marked', async () => {
    const w = await mountAs('estimator');
    const months = w.findAll('.month-name').map((m) => m.text());
    expect(months).toEqual(['January', 'March', 'July', 'Public holidays you work']);
    const rows = w.findAll('[data-test=holiday]');
    expect(rows.map((r) => r.find('.name').text())).toEqual([
      "New Year's Day",
      'Stocktaking day',
      'Independence Day',
      'Independence Day (substitute day)',
    ]);
    // The Gregorian calendar: July 4, 2027 is a Sunday, July 5 a Monday.
    expect(rows[2]!.text()).toContain('Weekend');
    expect(rows[3]!.text()).not.toContain('Weekend');
    expect(w.find('[data-test=holiday-count]').text()).toBe('3 working days off');
    expect(rows[0]!.text()).toContain('Passed');
  });

  it('lets an estimator read the calendar only', async () => {
    const w = await mountAs('estimator');
    expect(w.find('[data-test=remove-holiday]').exists()).toBe(false);
    expect(w.find('[data-test=load-public-holidays]').exists()).toBe(false);
    expect(w.find('[data-test=add-closure]').exists()).toBe(false);
    expect(w.find('[data-test=close-again]').exists()).toBe(false);
    expect(w.text()).toContain('Your shop’s admin keeps this calendar');
  });

  it('gives the admin a remove button on each day to come, and loads the place last loaded', async () => {
    const w = await mountAs('admin');
    expect(w.findAll('[data-test=remove-holiday]')).toHaveLength(3);
    loadPublic.mockResolvedValue({ added: [], alreadyThere: 12 });
    // The first form on the page is the public-holiday loader.
    await w.find('form').trigger('submit');
    await flushPromises();
    await new Promise((r) => setTimeout(r, 50));
    expect(loadPublic).toHaveBeenCalledTimes(1);
    expect(loadPublic).toHaveBeenCalledWith({ country: 'US', region: 'IL', year: new Date().getFullYear() });
  });
});
