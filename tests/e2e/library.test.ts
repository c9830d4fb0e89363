import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, screenshot, signIn } from './browser';

const browser = browserForFile();

describe('before ordering, in the browser', () => {
  it('shows the die library with a die near the end of its life, and logs a run', async () => {
    const p = await (await browser().newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await signIn(p, 'maya@larkspur.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.locator('[data-test=nav] >> text=Die library').click();
    // The demo's candle carton has run 240,000 of its 250,000 impressions: past 90 %.
    await expect.poll(() => p.locator('[data-test=library-table]').innerText()).toContain('Folding carton for candles');
    expect(await p.locator('[data-test=end-of-life]').count()).toBeGreaterThan(0);
    await p.locator('[data-test=library-table] >> text=Hotel door hanger').click();
    await p.locator('[data-test=run-impressions] input, input[data-test=run-impressions]').first().fill('1500');
    await p.locator('[data-test=run-add]').click();
    await expect.poll(() => p.locator('.ant-drawer').innerText()).toContain('9,500');
    await screenshot(p, '50-library');
  });

  it('advises scoring for heavy stock folded across the grain, with the usual creasing', async () => {
    const p = await (await browser().newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await signIn(p, 'maya@larkspur.example');
    await p.waitForURL(`${baseUrl}/`);
    await p.goto(`${baseUrl}/requests/new`);
    await p.locator('[data-test=req-caliper] input, input[data-test=req-caliper]').first().fill('20');
    await p.locator('[data-test=req-weight] input, input[data-test=req-weight]').first().fill('80');
    await p.locator('[data-test=req-weight-unit]').click();
    await p.locator('.ant-select-item-option', { hasText: 'lb cover' }).click();
    await p.locator('[data-test=fold-across]').click();
    await expect.poll(() => p.locator('[data-test=scoring-verdict]').innerText()).toBe('Score the folds');
    // Arithmetic: 80 lb cover × 453.59237 g/lb ÷ 500 sheets ÷ (20 × 26 in² × 0.00064516 m²/in²) = 216.3 g/m².
    expect(await p.locator('.ant-form-item', { hasText: 'Weight' }).innerText()).toContain('216.3 g/m²');
    expect(await p.locator('[data-test=creasing-guidance]').innerText()).toContain('creasing rule');
    await screenshot(p, '51-scoring-advice');
  });
});
