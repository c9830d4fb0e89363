import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';
import { postRequest } from './flows';

const browser = browserForFile();

const as = (email: string, width?: number) => pageAs(browser(), email, width);

/** Fills the bid form's amounts (die, ejection rubber, shipping, in that order) and sends it. */
async function bid(p: Page, amounts: string[], leadDays: number) {
  for (const [i, amount] of amounts.entries()) await p.locator(`[data-test=bid-amount-${i}]`).fill(amount);
  await p.locator('[data-test=bid-lead] input, input[data-test=bid-lead]').first().fill(String(leadDays));
  await p.locator('[data-test=bid-submit]').click();
}

/** The PDF's first page as text, read back with pdfjs-dist (a general-purpose PDF library). */
async function pdfText(path: string): Promise<string> {
  const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const standardFontDataUrl = join(
    dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')),
    'standard_fonts/',
  );
  const doc = await getDocument({
    data: new Uint8Array(await readFile(path)),
    useSystemFonts: false,
    disableFontFace: true,
    standardFontDataUrl,
  }).promise;
  const page = await doc.getPage(1);
  const content = await page.getTextContent();
  return content.items.map((item) => ('str' in item ? item.str : '')).join(' ');
}

describe('bidding in the browser', () => {
  it('revises a bid in yen: the form shows whole yen, and takes the revision', async () => {
    const buyer = await as('maya@larkspur.example');
    const id = await postRequest(buyer, `Yen carton ${Date.now() % 100000}`);
    const shop = await as('ken@brightline.example');
    await shop.goto(`${baseUrl}/requests/${id}`);
    await shop.locator('[data-test=bid-currency]').click();
    await shop.locator('.ant-select-item-option[title=JPY]').click();
    await bid(shop, ['150000', '2000', '1500'], 6);
    // ISO 4217: the yen has no minor unit, so ¥153,500 is 153500 in the bid's own units.
    await expect.poll(() => shop.locator('[data-test=my-bid-total]').innerText()).toBe('¥153,500');
    await shop.locator('[data-test=revise]').click();
    expect(await shop.locator('[data-test=bid-amount-0]').inputValue()).toBe('150000');
    await shop.locator('[data-test=bid-amount-0]').fill('140000');
    await expect.poll(() => shop.locator('[data-test=bid-total]').innerText()).toBe('¥143,500');
    await shop.locator('[data-test=bid-submit]').click();
    await expect.poll(() => shop.locator('[data-test=my-bid-total]').innerText()).toBe('¥143,500');
    await screenshot(shop, '19-estimator-yen-bid-revised');
    await shop.context().close();
    await buyer.context().close();
  });

  it('posts, takes two sealed bids and a revision, closes, compares, awards the dearer bid with a reason, ships and receives', async () => {
    const title = `Gift box sleeve ${Date.now() % 100000}`;
    const buyer = await as('maya@larkspur.example');
    const id = await postRequest(buyer, title);

    // Two die shops bid; the first revises before the deadline.
    const grace = await as('grace@brightline.example');
    await grace.goto(`${baseUrl}/requests/${id}`);
    await bid(grace, ['950.00', '40.00', '35.00'], 4);
    await expect.poll(() => grace.locator('[data-test=my-bid-total]').innerText()).toBe('$1,025.00');
    const chidi = await as('chidi@okafor.example');
    await chidi.goto(`${baseUrl}/requests/${id}`);
    await bid(chidi, ['900.00', '40.00', '35.00'], 9);
    await expect.poll(() => chidi.locator('[data-test=my-bid-total]').innerText()).toBe('$975.00');
    await grace.locator('[data-test=revise]').click();
    await grace.locator('[data-test=bid-amount-0]').fill('930.00');
    await expect.poll(() => grace.locator('[data-test=bid-total]').innerText()).toBe('$1,005.00');
    await grace.locator('[data-test=bid-submit]').click();
    await expect.poll(() => grace.locator('[data-test=my-bid-total]').innerText()).toBe('$1,005.00');
    await screenshot(grace, '20-estimator-bid-revised');

    // Purchasing sees nothing until bidding closes, then compares.
    const daniel = await as('daniel@larkspur.example');
    await daniel.goto(`${baseUrl}/requests/${id}`);
    expect(await daniel.locator('[data-test=sealed]').innerText()).toContain('sealed');
    expect(await daniel.locator('body').innerText()).not.toContain('1,005');
    await daniel.locator('[data-test=close-bidding]').click();
    await daniel.locator('.ant-popconfirm .ant-btn-primary, .ant-popover .ant-btn-primary').last().click();
    await expect
      .poll(() => daniel.locator('[data-test=comparison-table]').innerText())
      .toContain('Brightline Rule & Die');
    const table = await daniel.locator('[data-test=comparison-table]').innerText();
    expect(table).toContain('$975.00');
    expect(table).toContain('+$30.00');
    await screenshot(daniel, '21-bid-comparison');

    // Award the dearer bid: a reason is required.
    await daniel
      .locator('[data-test=comparison-table] tr', { hasText: 'Brightline' })
      .locator('button', { hasText: 'Award' })
      .click();
    await daniel.locator('.ant-modal .ant-btn-primary').click();
    await expect.poll(() => daniel.locator('[data-test=award-error]').innerText()).toContain('write why');
    await daniel.locator('[data-test=award-reason]').fill('Ships five working days sooner; our need-by date is tight.');
    await screenshot(daniel, '22-award-reason');
    await daniel.locator('.ant-modal .ant-btn-primary').click();
    await expect
      .poll(() => daniel.locator('[data-test=award-panel]').innerText())
      .toContain('Awarded to Brightline Rule & Die');

    // Everybody is told; the PDF carries the awarded total.
    // E-mails go through the outbox and the worker: wait for them to reach the catcher.
    const subjects = async (to: string) =>
      (
        (await (await fetch(`${process.env.MAIL_CATCHER_URL}/api/messages?to=${to}`)).json()) as Array<{
          subject: string;
        }>
      ).map((m) => m.subject);
    await expect
      .poll(() => subjects('grace@brightline.example'), { timeout: 20_000 })
      .toContain(
        `Awarded to you: ${title} (${await daniel
          .locator('[data-test=award-panel]')
          .innerText()
          .then((t) => /PO-\d{4}-\d{5}/.exec(t)![0])})`,
      );
    await expect.poll(() => subjects('chidi@okafor.example'), { timeout: 20_000 }).toContain(`Not awarded: ${title}`);
    const [download] = await Promise.all([
      daniel.waitForEvent('download'),
      daniel.locator('[data-test=po-pdf]').click(),
    ]);
    const text = await pdfText(await download.path());
    expect(text).toContain('$1,005.00');
    expect(text).toContain('Brightline Rule & Die');
    await screenshot(daniel, '23-awarded');

    // The loser learns only that; the winner makes and ships the die.
    await chidi.reload();
    await expect.poll(() => chidi.locator('[data-test=outcome-lost]').innerText()).toContain('Not awarded');
    expect(await chidi.locator('body').innerText()).not.toContain('Brightline');
    await grace.reload();
    await expect.poll(() => grace.locator('[data-test=outcome-won]').innerText()).toContain('PO-');
    await grace.locator('[data-test=start-production]').click();
    await grace.locator('[data-test=tracking]').fill('Ground parcel, tracking 1Z 999 000');
    await grace.locator('[data-test=ship]').click();
    await expect.poll(() => grace.locator('[data-test=shop-bid]').innerText()).toContain('1Z 999 000');
    await screenshot(grace, '24-estimator-shipped');

    // The buyer receives it, with the cautions shown.
    await buyer.goto(`${baseUrl}/requests/${id}`);
    await buyer.locator('[data-test=receive]').click();
    expect(await buyer.locator('.ant-modal [data-test=safety]').innerText()).toContain('gloves');
    await buyer.locator('.ant-modal .ant-btn-primary').click();
    await expect.poll(() => buyer.locator('[data-test=request-status]').innerText()).toBe('Received');
    await screenshot(buyer, '25-received');
  });
});
