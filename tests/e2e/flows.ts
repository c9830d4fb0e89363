import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { baseUrl } from './browser';

export const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../fixtures');

/** Picks a day in an ant-design date picker the way a person does: open it, page to the month, click. */
export async function pickDate(p: Page, testId: string, date: Date, withTime: boolean) {
  await p.locator(`[data-test=${testId}] input, input[data-test=${testId}]`).first().click();
  await p.waitForTimeout(300); // let a picker that just closed finish its animation
  const panel = p.locator('.ant-picker-dropdown:not(.ant-picker-dropdown-hidden)').last();
  const cell = panel.locator(`td.ant-picker-cell-in-view[title="${date.toISOString().slice(0, 10)}"]`);
  for (let i = 0; i < 3 && (await cell.count()) === 0; i++) await panel.locator('.ant-picker-header-next-btn').click();
  await cell.click();
  if (withTime) await panel.locator('.ant-picker-ok button').click();
}

/**
 * A print buyer, signed in, posts a request through the four steps, by default with the 8 × 5 in
 * sleeve DXF (26.79 in of cutting rule); or with another file, maybe one up laid out in a grid.
 */
export async function postRequest(
  p: Page,
  title: string,
  opts: {
    svg?: boolean;
    screenshots?: (name: string) => Promise<void>;
    dieline?: { file: string; metricsShow: string };
    oneUp?: { across: number; along: number; gutterIn: number };
    /** The caliper as typed in the user's units (points, or millimetres for a metric user). */
    caliper?: string;
    /** The press to choose (its name begins so) and the delivery postcode. */
    press?: string;
    postcode?: string;
    /** The bid deadline typed into the picker ("9 Dec 2026 17:00"), else picked 5 days on. */
    deadlineText?: string;
    /** Steps taken on a step before going on, such as choosing shops to invite. */
    onJobStep?: (p: Page) => Promise<void>;
    onPressStep?: (p: Page) => Promise<void>;
    onDielineStep?: (p: Page) => Promise<void>;
  } = {},
): Promise<number> {
  await p.goto(`${baseUrl}/requests/new`);
  await p.locator('[data-test=req-title]').fill(title);
  await p.locator('[data-test=req-job]').fill('LPC-E2E');
  await p.locator('[data-test=req-stock]').fill('16 pt SBS');
  await p
    .locator('[data-test=req-caliper] input, input[data-test=req-caliper]')
    .first()
    .fill(opts.caliper ?? '16');
  if (opts.oneUp) {
    await p.locator('[data-test=dieline-one-up]').click();
    await p.locator('input[data-test=ups-across]').fill(String(opts.oneUp.across));
    await p.locator('input[data-test=ups-along]').fill(String(opts.oneUp.along));
    await p.locator('input[data-test=gutter]').fill(String(opts.oneUp.gutterIn));
    await expect
      .poll(() => p.locator('input[data-test=req-ups]').inputValue())
      .toBe(String(opts.oneUp.across * opts.oneUp.along));
  }
  await opts.onJobStep?.(p);
  await p.locator('[data-test=next]').click();
  await p.locator('[data-test=req-press]').click();
  const press = opts.press ?? 'Platen 1';
  await p.locator(`.ant-select-item-option >> text=${press}`).click();
  await p.locator('[data-test=req-sheets] input, input[data-test=req-sheets]').first().fill('10000');
  if (opts.deadlineText) {
    const deadline = p.locator('[data-test=req-deadline] input');
    await deadline.click();
    await deadline.fill(opts.deadlineText);
    await deadline.press('Enter');
  } else await pickDate(p, 'req-deadline', new Date(Date.now() + 5 * 86_400_000), true);
  await pickDate(p, 'req-needby', new Date(Date.now() + 30 * 86_400_000), false);
  await p.locator('[data-test=req-postcode]').fill(opts.postcode ?? '60614');
  await opts.onPressStep?.(p);
  await p.locator('[data-test=next]').click();
  await p.waitForURL(/\/requests\/\d+\/edit/);
  const input = p.locator('[data-test=dieline-drop] input[type=file]');
  await input.setInputFiles(opts.dieline?.file ?? path.join(fixtures, 'sleeve-8x5.dxf'));
  await expect.poll(() => p.locator('[data-test=file-list]').innerText(), { timeout: 20_000 }).toContain('measured');
  if (opts.svg) {
    await input.setInputFiles(path.join(fixtures, 'tag-100x50mm.svg'));
    await expect
      .poll(async () => (await p.locator('[data-test=file-list]').innerText()).match(/measured/g)?.length ?? 0, {
        timeout: 20_000,
      })
      .toBe(2);
    await p.locator('[data-test=file-list] >> text=sleeve-8x5.dxf').click();
  }
  await expect
    .poll(() => p.locator('[data-test=metrics]').innerText())
    .toContain(opts.dieline?.metricsShow ?? '26.79 in');
  await opts.screenshots?.('dieline');
  await opts.onDielineStep?.(p);
  await p.locator('[data-test=next]').click();
  await expect.poll(() => p.locator('[data-test=request-checks]').innerText()).toContain(`fits ${press}`);
  await opts.screenshots?.('review');
  await p.locator('[data-test=publish]').click();
  await p.waitForURL(/\/requests\/\d+$/);
  await expect.poll(() => p.locator('[data-test=request-status]').innerText()).toBe('Open for bids');
  return Number(new URL(p.url()).pathname.split('/').pop());
}
