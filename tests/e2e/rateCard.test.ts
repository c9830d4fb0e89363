import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';
import { postRequest } from './flows';

const browser = browserForFile();

const as = (email: string, width?: number) => pageAs(browser(), email, width);

describe('the die shop’s rate card', () => {
  const title = `Sleeve priced from the card ${Date.now() % 100000}`;
  let requestId = 0;

  it('lets the shop’s admin set a rate and save the card', async () => {
    const admin = await as('ken@brightline.example');
    await admin.locator('[data-test=nav] >> text=Rate card').click();
    await admin.locator('[data-test=card-cut]').fill('8.50');
    await admin.locator('[data-test=card-save]').click();
    await expect.poll(() => admin.locator('.ant-message').innerText()).toContain('Rate card saved');
    await admin.reload();
    await expect.poll(() => admin.locator('[data-test=card-cut]').inputValue()).toBe('8.50');
    await screenshot(admin, '22-rate-card');
  });

  it('fills a bid from the card; the estimator changes a line and sends it', async () => {
    const buyer = await as('maya@larkspur.example');
    requestId = await postRequest(buyer, title);
    const shop = await as('grace@brightline.example');
    await shop.goto(`${baseUrl}/requests/${requestId}`);
    await shop.locator('[data-test=fill-from-card]').click();
    // The sleeve DXF has 26.79 in of cutting rule: the first line shows its working at the card's rate.
    await expect.poll(() => shop.locator('[data-test=bid-form]').innerText()).toContain('Send bid');
    await expect
      .poll(() => shop.locator('[data-test=bid-form] input[placeholder="Description (optional)"]').first().inputValue())
      .toBe('Cutting rule: 26.8 in × $8.50');
    // 26.786 in (the sleeve's measured cutting rule) × 8.50 = 227.68.
    expect(await shop.locator('[data-test=bid-amount-0]').inputValue()).toBe('227.68');
    const amounts = shop.locator('[data-test^=bid-amount-]');
    const last = (await amounts.count()) - 1;
    await shop.locator(`[data-test=bid-amount-${last}]`).fill('38.00'); // shipping, which the card does not price
    await shop.locator('[data-test=bid-amount-0]').fill('240.00'); // the estimator's own judgement
    const total = await shop.locator('[data-test=bid-total]').innerText();
    expect(total).toMatch(/^\$[\d,]+\.\d\d$/);
    await screenshot(shop, '23-bid-from-card');
    await shop.locator('[data-test=bid-submit]').click();
    await expect.poll(() => shop.locator('[data-test=my-bid-total]').innerText()).toBe(total);
  });
});
