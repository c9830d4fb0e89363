import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launch, screenshot, signIn } from './browser';
import { postRequest } from './flows';

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
    await p.waitForURL('**/requests/new');
    // Dieline: an inch DXF and a millimetre SVG; the metrics table shows the DXF's 26.79 in of cutting rule.
    const id = await postRequest(p, title, { svg: true, screenshots: (name) => screenshot(p, `11-request-${name}`) });
    expect(id).toBeGreaterThan(0);
    expect(await p.locator('[data-test=dieline-svg] path[data-rule=crease]').count()).toBe(1);
    expect(await p.locator('[data-test=safety]').innerText()).toContain('Lock out');
    await screenshot(p, '13-request-detail');
  });

  it('shows the request on a die shop’s open list, with its metrics', async () => {
    const p = await page();
    await signIn(p, 'grace@brightline.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.locator('[data-test=nav] >> text=Open requests').click();
    await p.locator('[data-test=open-requests-table]').waitFor();
    await screenshot(p, '14-open-requests');
    // Open requests page at 25: find this run's request by its title.
    await p
      .locator('input[data-test=open-requests-search], [data-test=open-requests-search] input')
      .first()
      .fill(title);
    await expect.poll(() => p.locator('[data-test=open-requests-table]').innerText()).toContain(title);
    await p.locator(`[data-test=open-requests-table] >> text=${title}`).click();
    await expect.poll(() => p.locator('[data-test=metrics]').innerText()).toContain('Cutting rule');
    expect(await p.locator('[data-test=dieline-drop]').count()).toBe(0);
    await screenshot(p, '15-estimator-request');
  });
});
