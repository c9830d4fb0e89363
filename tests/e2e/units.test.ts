import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs } from './browser';

const browser = browserForFile();

describe('inches or millimetres, and the locale', () => {
  it('shows a user every length in the units they choose, and keeps the choice', async () => {
    const p = await pageAs(browser(), 'lena@cedarbend.example', 390);
    const choose = async (units: 'in' | 'mm') => {
      await p.locator('[data-test=user-menu]').click();
      await p.locator(`[data-test=units-${units}]`).click();
      await expect.poll(() => p.locator('.ant-message').innerText()).toContain('Lengths are now shown in');
    };
    await p.goto(`${baseUrl}/open-requests?canMake=false`);
    await choose('mm');
    const board = p.locator('main .ant-table-tbody');
    await expect.poll(() => board.innerText()).toMatch(/[\d,]+ mm/);
    expect(await board.innerText()).not.toMatch(/\d in\b/);
    await p.locator('main .ant-table-tbody tr').first().click();
    await p.waitForURL(/\/requests\/\d+$/);
    const metrics = p.locator('[data-test=metrics]');
    // The metrics table leads with millimetres and gives inches beside them (1 in = 25.4 mm exactly).
    await expect.poll(() => metrics.innerText()).toMatch(/Total\s+[\d,.]+ mm\s+[\d.]+/);
    await p.reload();
    await expect.poll(() => metrics.innerText()).toMatch(/Die board\s+[\d.]+ × [\d.]+ mm/);
    await choose('in');
    await expect.poll(() => metrics.innerText()).toMatch(/Die board\s+[\d.]+ × [\d.]+ in/);
  });

  it('writes dates day first for a user who chooses British English', async () => {
    const p = await pageAs(browser(), 'oscar@cedarbend.example');
    await p.goto(`${baseUrl}/open-requests?canMake=false`);
    const board = p.locator('main .ant-table-tbody');
    // US English puts the month first: "Dec 6, 2026, 13:29 CST".
    await expect.poll(() => board.innerText()).toMatch(/[A-Z][a-z]{2} \d{1,2}, \d{4}, \d\d:\d\d/);
    await p.locator('[data-test=user-menu]').click();
    await p.locator('[data-test=locale-en-GB]').click();
    await expect.poll(() => p.locator('.ant-message').innerText()).toContain('British English');
    // British English puts the day first: "6 Dec 2026, 13:29".
    await expect.poll(() => board.innerText()).toMatch(/\d{1,2} [A-Z][a-z]{2} \d{4}, \d\d:\d\d/);
    await p.locator('[data-test=user-menu]').click();
    await p.locator('[data-test=locale-en-US]').click();
    await expect.poll(() => board.innerText()).toMatch(/[A-Z][a-z]{2} \d{1,2}, \d{4}, \d\d:\d\d/);
  });
});
