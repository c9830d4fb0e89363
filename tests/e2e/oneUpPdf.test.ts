import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pdfFile, PT, separation } from '@kerfmark/dieline/testing';
import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';
import { postRequest } from './flows';

const browser = browserForFile();

const as = (email: string, width?: number) => pageAs(browser(), email, width);

// One up as an artwork program exports it: a 4 × 3 in carton blank outline on the "Cut"
// separation and a 4 in crease across it on "Crease" (72 pt = 1 in), plus a filled panel of
// artwork. Laid out 3 across × 4 along with no gutter, the whole die is a 12 × 12 in grid:
// 5 rows and 4 columns of 12 in cutting rule, 108 in with shared cuts counted once, and
// 12 creases of 4 in, 48 in (geometry).
function oneUpPdf(): string {
  const file = join(mkdtempSync(join(tmpdir(), 'kerfmark-e2e-')), 'blank-1up.pdf');
  const content = [
    '0.9 0.95 0.9 rg 20 20 200 150 re f',
    `/C0 CS 1 SCN 0 0 ${4 * PT} ${3 * PT} re S`,
    `/C1 CS 1 SCN 0 ${1.5 * PT} m ${4 * PT} ${1.5 * PT} l S`,
  ].join('\n');
  writeFileSync(
    file,
    pdfFile([{ content, resources: '<< /ColorSpace << /C0 {{cut}} /C1 {{crease}} >> >>', deflate: true }], {
      objects: { cut: separation('Cut'), crease: separation('Crease', '1 0 0 0') },
    }),
  );
  return file;
}

describe('a one-up PDF stepped and repeated into the whole die', () => {
  const title = `Carton blank, one-up PDF ${Date.now() % 100000}`;
  let requestId = 0;

  it('lets a buyer post a one-up PDF as 3 × 4 up with no gutter and shows the whole die', async () => {
    const p = await as('maya@larkspur.example');
    const id = await postRequest(p, title, {
      oneUp: { across: 3, along: 4, gutterIn: 0 },
      dieline: { file: oneUpPdf(), metricsShow: '108.00 in' },
      screenshots: (name) => screenshot(p, `16-one-up-${name}`),
    });
    const metrics = await p.locator('[data-test=metrics]').innerText();
    expect(metrics).toContain('48.00 in'); // the creases
    expect(metrics).toMatch(/3 across × 4 along \(12 up\), gutter 0 in, shared cuts/);
    expect(metrics).toContain('14.00 × 14.00 in'); // the die board: 12 in plus 1 in each side
    expect(await p.locator('[data-test=dieline-svg] path[data-rule=crease]').count()).toBeGreaterThan(0);
    expect(await p.locator('.page-subtitle').innerText()).toContain('12 up (one up, laid out 3 across × 4 along');
    requestId = id;
    await screenshot(p, '17-one-up-request');
  });

  it('shows the die shop the whole die to bid on', async () => {
    const shop = await as('grace@brightline.example');
    await shop.locator('[data-test=nav] >> text=Open requests').click();
    await shop
      .locator('input[data-test=open-requests-search], [data-test=open-requests-search] input')
      .first()
      .fill(title);
    await shop.locator(`[data-test=open-requests-table] >> text=${title}`).click();
    await expect.poll(() => shop.locator('[data-test=metrics]').innerText()).toContain('108.00 in');
    expect(await shop.locator('[data-test=layout-summary]').innerText()).toContain('3 across × 4 along');
    for (const [i, amount] of ['1250.00', '60.00', '45.00'].entries())
      await shop.locator(`[data-test=bid-amount-${i}]`).fill(amount);
    await shop.locator('[data-test=bid-lead] input, input[data-test=bid-lead]').first().fill('6');
    await shop.locator('[data-test=bid-submit]').click();
    await expect.poll(() => shop.locator('[data-test=my-bid-total]').innerText()).toBe('$1,355.00');
    await screenshot(shop, '18-one-up-shop-bid');
  });

  it('reads on a phone', async () => {
    const p = await as('maya@larkspur.example', 390);
    await p.goto(`${baseUrl}/requests/${requestId}`);
    await expect.poll(() => p.locator('[data-test=metrics]').innerText()).toContain('108.00 in');
    await screenshot(p, '19-one-up-phone');
  });
});
