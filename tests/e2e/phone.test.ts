import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';

const browser = browserForFile();

describe('on a phone', () => {
  it('sorts the stacked board from the sort list, the headers being hidden', async () => {
    const p = await pageAs(browser(), 'grace@brightline.example', 390);
    await p.goto(`${baseUrl}/open-requests?canMake=false`);
    const rows = p.locator('main .ant-table-tbody > tr:not(.ant-table-placeholder)');
    await expect.poll(() => rows.count()).toBeGreaterThan(1);
    expect(await p.locator('main .ant-table-thead').isVisible()).toBe(false);
    await p.locator('[data-test=phone-sort]').click();
    await p.locator('.ant-select-item-option >> text=Rule, longest first').click();
    // Each row's rule length, as its stacked "Rule" field shows it ("260.3 in").
    const lengths = async () =>
      (await p.locator('main td[data-label="Rule"]').allInnerTexts()).map((t) => Number(t.replace(/[^\d.]/g, '')));
    await expect
      .poll(async () => {
        const l = await lengths();
        return l.length > 1 && l.every((v, i) => i === 0 || v <= l[i - 1]!);
      })
      .toBe(true);
    await screenshot(p, 'phone-board-sorted');
  });

  // Nothing wider than the screen at a phone's and a tablet's width: the page never scrolls sideways.
  for (const width of [390, 768]) {
    it(`fits the board, a request and the bid form into ${width} px`, async () => {
      const p = await pageAs(browser(), 'grace@brightline.example', width);
      const overflow = () => p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      await p.goto(`${baseUrl}/open-requests?canMake=false`);
      await p.locator('main .ant-table-tbody > tr:not(.ant-table-placeholder)').first().waitFor();
      expect(await overflow()).toBeLessThanOrEqual(0);
      await screenshot(p, `board-${width}`);
      await p.locator('main .ant-table-tbody > tr:not(.ant-table-placeholder)').first().click();
      await p.waitForURL(/\/requests\/\d+$/);
      await p.locator('[data-test=metrics]').waitFor();
      expect(await overflow()).toBeLessThanOrEqual(0);
      await screenshot(p, `request-and-bid-form-${width}`);
    });

    it(`fits the buyer's list and the price history into ${width} px`, async () => {
      const p = await pageAs(browser(), 'daniel@larkspur.example', width);
      const overflow = () => p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      for (const path of ['/requests', '/price-history']) {
        await p.goto(`${baseUrl}${path}`);
        await p.locator('main .ant-table-tbody > tr:not(.ant-table-placeholder)').first().waitFor();
        expect(await overflow(), path).toBeLessThanOrEqual(0);
        await screenshot(p, `${path.slice(1)}-${width}`);
      }
    });
  }
});
