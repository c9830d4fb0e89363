import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';
import { fixtures, postRequest } from './flows';

const browser = browserForFile();

/** The instant a wall-clock time on a date has in a zone, found by asking ICU (Intl) about each whole-hour offset. */
function instantOf(date: { y: number; m: number; d: number }, hour: number, timeZone: string): Date {
  const clock = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    dateStyle: 'short',
    timeStyle: 'short',
    hourCycle: 'h23',
  });
  const want = `${date.y}-${String(date.m).padStart(2, '0')}-${String(date.d).padStart(2, '0')}, ${String(hour).padStart(2, '0')}:00`;
  for (let offset = -14; offset <= 14; offset++) {
    const candidate = new Date(Date.UTC(date.y, date.m - 1, date.d, hour - offset));
    if (clock.format(candidate) === want) return candidate;
  }
  throw new Error(`no instant shows ${want} in ${timeZone}`);
}

describe('a metric buyer in Berlin and a die shop in Chicago', () => {
  it('posts in millimetres and Berlin time; the shop reads inches in its own zone', async () => {
    // Browsers in other zones again: the app follows each organisation's zone, not the browser's.
    const hanna = await pageAs(browser(), 'hanna@elbstrom.example', 1440, 'America/Los_Angeles');
    // A deadline a week on at 17:00 in Berlin, typed as a British user writes it (day first).
    const day = new Date(Date.now() + 7 * 86_400_000);
    const part = (options: Intl.DateTimeFormatOptions) =>
      new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/Berlin', ...options }).format(day);
    const date = {
      y: Number(part({ year: 'numeric' })),
      m: Number(part({ month: 'numeric' })),
      d: Number(part({ day: 'numeric' })),
    };
    const typed = `${date.d} ${part({ month: 'short' })} ${date.y} 17:00`;
    const title = `Metric sleeve ${Date.now()}`;
    const id = await postRequest(hanna, title, {
      caliper: '0.4',
      press: 'Flachbett 1',
      postcode: '12099',
      deadlineText: typed,
      dieline: { file: path.join(fixtures, 'sleeve-8x5.dxf'), metricsShow: ' mm' },
      onJobStep: async (p) => {
        // The finished size typed in millimetres, the unit named beside the field.
        const width = p.locator('input[data-test=req-piece-width]');
        await width.fill('200');
        await p.locator('input[data-test=req-piece-height]').fill('150');
        await width.blur();
        const unit = p.locator('.ant-input-number-group-wrapper', { has: width }).locator('.ant-select-selection-item');
        expect(await unit.innerText()).toBe('mm');
      },
    });
    await screenshot(hanna, 'metric-buyer-request');
    const deadline = instantOf(date, 17, 'Europe/Berlin');
    const shown = (locale: string, timeZone: string) =>
      new Intl.DateTimeFormat(locale, {
        day: 'numeric',
        month: 'short',
        year: 'numeric',
        hour: '2-digit',
        minute: '2-digit',
        hourCycle: 'h23',
        timeZone,
        timeZoneName: 'short',
      }).format(deadline);
    const subtitle = hanna.locator('.page-subtitle');
    await expect.poll(() => subtitle.innerText()).toContain(`due ${shown('en-GB', 'Europe/Berlin')}`);
    // 200 mm = 7.874 in and 150 mm = 5.906 in (1 in = 25.4 mm exactly); shown back in millimetres.
    expect(await hanna.locator('main').innerText()).toContain('200.0 × 150.0 mm');
    // 0.4 mm = 15.748 thousandths of an inch: the caliper in millimetres first, points beside.
    expect(await hanna.locator('main').innerText()).toContain('0.40 mm (15.7 pt)');
    expect(await hanna.locator('[data-test=metrics]').innerText()).toMatch(/Total\s+[\d,.]+ mm/);

    const grace = await pageAs(browser(), 'grace@brightline.example', 1440, 'Asia/Tokyo');
    await grace.goto(`${baseUrl}/requests/${id}`);
    const theirs = grace.locator('.page-subtitle');
    await expect.poll(() => theirs.innerText()).toContain(`due ${shown('en-US', 'America/Chicago')}`);
    expect(await grace.locator('main').innerText()).toContain('7.87 × 5.91 in');
    expect(await grace.locator('main').innerText()).toContain('15.7 pt (0.40 mm)');
    await expect.poll(() => grace.locator('[data-test=metrics]').innerText()).toMatch(/Total\s+[\d,.]+ in/);
    await screenshot(grace, 'metric-buyer-shop-view');
  });
});
