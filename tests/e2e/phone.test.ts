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
});
