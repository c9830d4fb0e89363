import { writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, screenshot, signIn } from './browser';

const browser = browserForFile();

describe('price history in the browser', () => {
  it('shows purchasing the fit, the charts and the records, and imports a CSV', async () => {
    const p = await (await browser().newContext({ viewport: { width: 1440, height: 900 } })).newPage();
    await signIn(p, 'daniel@larkspur.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.locator('[data-test=nav] >> text=Price history').click();
    await expect.poll(() => p.locator('[data-test=fit]').innerText()).toMatch(/model, R²/);
    await expect.poll(() => p.locator('[data-test=price-scatter] canvas').count()).toBeGreaterThan(0);
    // Each chart says in words what it draws, and gives its figures as a table.
    expect(await p.locator('[data-test=price-scatter-summary]').innerText()).toMatch(
      /^\d+ received dies with [\d.]+ in to [\d.]+ in of rule, priced \$[\d,.]+ to \$[\d,.]+\./,
    );
    expect(await p.locator('[data-test=price-scatter] details table tbody tr').count()).toBeGreaterThan(1);
    await expect.poll(() => p.locator('[data-test=price-table]').innerText()).toContain('Brightline Rule & Die');
    await p.waitForTimeout(800); // let the charts finish drawing
    await screenshot(p, '40-price-history');

    const csv = path.join(os.tmpdir(), `kerfmark-prices-${Date.now()}.csv`);
    writeFileSync(
      csv,
      'Date,Supplier,Die price,Rule length (in)\n2025-06-02,Harbour Dies,655.00,88.5\n2025-07-14,Harbour Dies,1210.00,190\n',
    );
    await p.locator('[data-test=import]').click();
    await p.locator('[data-test=import-drop] input[type=file]').setInputFiles(csv);
    await expect.poll(() => p.locator('[data-test=import-go]').innerText()).toContain('Import 2 rows');
    await screenshot(p, '41-price-import');
    await p.locator('[data-test=import-go]').click();
    await expect.poll(() => p.locator('.ant-message').innerText()).toContain('2 price records imported');
    // The new shop is now one to filter by.
    await p.locator('[data-test=shop-filter]').click();
    await p.locator('.ant-select-item-option', { hasText: 'Harbour Dies' }).click();
    await expect.poll(() => p.locator('[data-test=price-table]').innerText()).toContain('$1,210.00');
  });
});
