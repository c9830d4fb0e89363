import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';
import { pickDate, postRequest } from './flows';

const browser = browserForFile();

const as = (email: string, width?: number) => pageAs(browser(), email, width);

/** Picks an option of a searchable ant-design select by typing its label. */
async function choose(p: Page, testId: string, label: string) {
  await p.locator(`[data-test=${testId}]`).click();
  await p.keyboard.type(label);
  await p.locator(`.ant-select-item-option[title="${label}"]`).click();
}

const DAY = 86_400_000;
const shipsBy = (p: Page) => p.locator('[data-test=my-bid-ships]').getAttribute('data-date');

describe('the die shop’s holidays', () => {
  it('loads public holidays, and a closure the admin adds moves the ship date a bid promises', async () => {
    const admin = await as('ken@brightline.example');
    await admin.locator('[data-test=nav] >> text=Holidays').click();
    await choose(admin, 'holiday-country', 'United States of America (US)');
    await choose(admin, 'holiday-region', 'Illinois');
    await admin.locator('[data-test=load-public-holidays]').click();
    await expect.poll(() => admin.locator('.ant-message').innerText()).toMatch(/holiday/i);
    // Fixed-date US federal holidays (5 U.S.C. 6103): New Year's Day, Independence Day, Christmas Day.
    const months = admin.locator('[data-test=holiday-months]');
    await expect.poll(() => months.innerText()).toContain('Independence Day');
    expect(await months.innerText()).toContain('Christmas Day');
    await screenshot(admin, '31-holidays');

    // A bid of 2 working days promises a ship date; closing the shop that day moves it on.
    const buyer = await as('maya@larkspur.example');
    const requestId = await postRequest(buyer, `Sleeve for the holiday check ${Date.now() % 100000}`);
    const shop = await as('grace@brightline.example');
    await shop.goto(`${baseUrl}/requests/${requestId}`);
    const amounts = shop.locator('[data-test^=bid-amount-]');
    await expect.poll(() => amounts.count()).toBeGreaterThan(0);
    for (let i = 0; i < (await amounts.count()); i++) await amounts.nth(i).fill(i === 0 ? '300.00' : '25.00');
    await shop.locator('input[data-test=bid-lead], [data-test=bid-lead] input').first().fill('2');
    await shop.locator('[data-test=bid-submit]').click();
    await expect.poll(() => shipsBy(shop)).toMatch(/^\d{4}-\d\d-\d\d$/);
    const before = (await shipsBy(shop))!;

    await pickDate(admin, 'closure-date', new Date(`${before}T12:00:00Z`), false);
    await admin.locator('[data-test=closure-name]').fill('Floor resurfacing');
    await admin.locator('[data-test=add-closure]').click();
    await expect.poll(() => months.innerText()).toContain('Floor resurfacing');

    await shop.locator('[data-test=revise]').click();
    await shop.locator('[data-test=bid-submit]').click();
    await expect.poll(() => shipsBy(shop)).not.toBe(before);
    const after = new Date(`${(await shipsBy(shop))!}T00:00:00Z`);
    const gap = (after.getTime() - new Date(`${before}T00:00:00Z`).getTime()) / DAY;
    // The next working day: at most over a weekend and one more holiday.
    expect(gap).toBeGreaterThanOrEqual(1);
    expect(gap).toBeLessThanOrEqual(4);
    expect([0, 6]).not.toContain(after.getUTCDay());

    // Removing the closure makes the day a working day again.
    await admin.locator('[aria-label="Remove Floor resurfacing"]').click();
    await admin.locator('.ant-popconfirm .ant-btn-primary, .ant-popover .ant-btn-primary').last().click();
    await expect.poll(() => months.innerText()).not.toContain('Floor resurfacing');
  });

  it('shows the calendar and its forms at a phone’s width', async () => {
    const admin = await as('ken@brightline.example', 390);
    await admin.goto(`${baseUrl}/holidays`);
    await expect.poll(() => admin.locator('[data-test=holiday-months]').innerText()).toContain('Christmas Day');
    // Nothing on the page is wider than the page itself: the months and the forms wrap.
    const page = admin.locator('.page').first();
    const [scroll, client] = await page.evaluate((el) => [el.scrollWidth, el.clientWidth]);
    expect(scroll).toBeLessThanOrEqual(client);
    await screenshot(admin, '32-holidays-phone');
  });
});
