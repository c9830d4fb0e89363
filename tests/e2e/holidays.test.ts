import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launch, screenshot, signIn } from './browser';
import { pickDate } from './flows';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

async function as(email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const p = await context.newPage();
  await signIn(p, email);
  await p.waitForURL(`${baseUrl}/`);
  return p;
}

/**
 * A day five to nine weeks ahead that no US or Illinois public holiday falls on: a Wednesday from
 * the 8th to the 14th (the Monday and Thursday holidays miss it), not Veterans Day (November 11)
 * nor Lincoln's Birthday (February 12). US federal holiday rules, 5 U.S.C. 6103; Illinois from memory.
 */
function quietDay(): Date {
  const day = new Date(Date.now() + 35 * 86_400_000);
  day.setUTCHours(12, 0, 0, 0);
  const holiday = (d: Date) => ['10-11', '1-12'].includes(`${d.getUTCMonth()}-${d.getUTCDate()}`);
  while (day.getUTCDay() !== 3 || day.getUTCDate() < 8 || day.getUTCDate() > 14 || holiday(day))
    day.setUTCDate(day.getUTCDate() + 1);
  return day;
}

describe('the die shop’s holidays', () => {
  it('shows an estimator the year’s holidays, read only', async () => {
    const grace = await as('grace@brightline.example');
    await grace.locator('[data-test=nav] >> text=Holidays').click();
    // The demo shop has this year's US and Illinois public holidays; July 4 is one every year.
    await expect.poll(() => grace.locator('[data-test=holiday-months]').innerText()).toContain('Independence Day');
    expect(await grace.locator('[data-test=remove-holiday]').count()).toBe(0);
    expect(await grace.locator('[data-test=add-closure]').count()).toBe(0);
  });

  it('lets the shop’s admin add a closure, which shows in its month, and remove it', async () => {
    const ken = await as('ken@brightline.example');
    await ken.locator('[data-test=nav] >> text=Holidays').click();
    const name = `Stocktaking ${Date.now() % 100000}`;
    await pickDate(ken, 'closure-date', quietDay(), false);
    await ken.locator('[data-test=closure-name]').fill(name);
    await ken.locator('[data-test=add-closure]').click();
    await expect.poll(() => ken.locator('.ant-message').innerText()).toContain(`${name} on`);
    const row = ken.locator('[data-test=holiday]', { hasText: name });
    await expect.poll(() => row.count()).toBe(1);
    expect(await row.innerText()).toContain('Shop closure');
    await screenshot(ken, '26-holidays');
    await row.locator('[data-test=remove-holiday]').click();
    await ken.locator('.ant-popconfirm .ant-btn-primary, .ant-popover .ant-btn-primary').last().click();
    await expect.poll(() => row.count()).toBe(0);
  });
});
