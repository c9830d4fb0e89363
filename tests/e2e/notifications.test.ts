import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, screenshot, signIn } from './browser';

const browser = browserForFile();

describe('deadlines and notifications in the browser', () => {
  it('shows the buyer what is at risk and what is coming up', async () => {
    const p = await (await browser().newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await signIn(p, 'maya@larkspur.example');
    await p.waitForURL(`${baseUrl}/`);
    // The demo label sheet is needed in 6 days: 5 working days of lead time and the run do not fit.
    await expect.poll(() => p.locator('[data-test=at-risk]').innerText()).toContain('Rounded label sheet');
    await expect.poll(() => p.locator('[data-test=upcoming]').innerText()).toContain('Bids due');
    await screenshot(p, '30-buyer-home-deadlines');
  });

  it('lets a user choose which notices also come by e-mail', async () => {
    const p = await (await browser().newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await signIn(p, 'lena@cedarbend.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.goto(`${baseUrl}/notifications`);
    const row = p.locator('[data-test=preferences] .pref', { hasText: 'Bids due in 24 hours' });
    await expect.poll(() => row.locator('button[role=switch]').getAttribute('aria-checked')).toBe('true');
    await row.locator('button[role=switch]').click();
    await expect.poll(() => row.locator('button[role=switch]').getAttribute('aria-checked')).toBe('false');
    await p.reload();
    await expect
      .poll(() =>
        p
          .locator('[data-test=preferences] .pref', { hasText: 'Bids due in 24 hours' })
          .locator('button[role=switch]')
          .getAttribute('aria-checked'),
      )
      .toBe('false');
    await screenshot(p, '31-notifications');
  });
});
