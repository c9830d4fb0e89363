import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launch, screenshot, signIn } from './browser';

const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../fixtures');
let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

async function page(): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  return context.newPage();
}

/** Picks a day in an ant-design date picker the way a person does: open it, page to the month, click. */
async function pickDate(p: Page, testId: string, date: Date, withTime: boolean) {
  await p.locator(`[data-test=${testId}] input`).click();
  await p.waitForTimeout(300); // let a picker that just closed finish its animation
  const panel = p.locator('.ant-picker-dropdown:not(.ant-picker-dropdown-hidden)').last();
  const cell = panel.locator(`td.ant-picker-cell-in-view[title="${date.toISOString().slice(0, 10)}"]`);
  for (let i = 0; i < 3 && (await cell.count()) === 0; i++) await panel.locator('.ant-picker-header-next-btn').click();
  await cell.click();
  if (withTime) await panel.locator('.ant-picker-ok button').click();
}

describe('a print buyer posts a die request and a die shop sees it', () => {
  const title = `Sleeve for gift box ${Date.now() % 100000}`;

  it('posts a request with a DXF and an SVG, and shows the preview and metrics', async () => {
    const p = await page();
    await signIn(p, 'maya@larkspur.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.locator('[data-test=nav] >> text=Die requests').click();
    await expect.poll(() => p.locator('[data-test=requests-table]').innerText()).toContain('Straight tuck-end carton');
    await screenshot(p, '10-requests-list');
    await p.locator('[data-test=new-request]').click();

    // Step 1: job and stock.
    await p.locator('[data-test=req-title]').fill(title);
    await p.locator('[data-test=req-job]').fill('LPC-E2E');
    await p.locator('[data-test=req-stock]').fill('16 pt SBS');
    await p.locator('[data-test=req-caliper] input, input[data-test=req-caliper]').first().fill('16');
    await p.locator('[data-test=next]').click();

    // Step 2: press and dates.
    await p.locator('[data-test=req-press]').click();
    await p.locator('.ant-select-item-option >> text=Platen 1').click();
    await p.locator('[data-test=req-sheets] input, input[data-test=req-sheets]').first().fill('10000');
    await pickDate(p, 'req-deadline', new Date(Date.now() + 5 * 86_400_000), true);
    await pickDate(p, 'req-needby', new Date(Date.now() + 30 * 86_400_000), false);
    await p.locator('[data-test=req-postcode]').fill('60614');
    await p.locator('[data-test=next]').click();

    // Step 3: the dielines, by drag-and-drop's file input.
    await p.waitForURL(/\/requests\/\d+\/edit/);
    const input = p.locator('[data-test=dieline-drop] input[type=file]');
    await input.setInputFiles(path.join(fixtures, 'sleeve-8x5.dxf'));
    await expect.poll(() => p.locator('[data-test=file-list]').innerText(), { timeout: 20_000 }).toContain('measured');
    await input.setInputFiles(path.join(fixtures, 'tag-100x50mm.svg'));
    await expect.poll(async () => (await p.locator('[data-test=file-list]').innerText()).match(/measured/g)?.length ?? 0, { timeout: 20_000 }).toBe(2);
    await p.locator('[data-test=file-list] >> text=sleeve-8x5.dxf').click();
    await expect.poll(() => p.locator('[data-test=metrics]').innerText()).toContain('26.79 in');
    expect(await p.locator('[data-test=dieline-svg] path[data-rule=crease]').count()).toBe(1);
    await screenshot(p, '11-request-dieline');

    // Step 4: review and publish.
    await p.locator('[data-test=next]').click();
    await expect.poll(() => p.locator('[data-test=request-checks]').innerText()).toContain('fits Platen 1');
    await screenshot(p, '12-request-review');
    await p.locator('[data-test=publish]').click();
    await p.waitForURL(/\/requests\/\d+$/);
    await expect.poll(() => p.locator('[data-test=request-status]').innerText()).toBe('Open for bids');
    expect(await p.locator('[data-test=safety]').innerText()).toContain('Lock out');
    await screenshot(p, '13-request-detail');
  });

  it('shows the request on a die shop’s open list, with its metrics', async () => {
    const p = await page();
    await signIn(p, 'grace@brightline.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.locator('[data-test=nav] >> text=Open requests').click();
    await expect.poll(() => p.locator('[data-test=marketplace-table]').innerText()).toContain(title);
    await screenshot(p, '14-open-requests');
    await p.locator(`[data-test=marketplace-table] >> text=${title}`).click();
    await expect.poll(() => p.locator('[data-test=metrics]').innerText()).toContain('Cutting rule');
    expect(await p.locator('[data-test=dieline-drop]').count()).toBe(0);
    await screenshot(p, '15-estimator-request');
  });
});
