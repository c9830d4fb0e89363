import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';
import { postRequest } from './flows';

const browser = browserForFile();

const as = (email: string, width?: number) => pageAs(browser(), email, width);

const choices = (p: Page) => p.locator('[data-test=shop-choice]');
const choice = (p: Page, name: string) => choices(p).filter({ hasText: name });

describe('inviting die shops', () => {
  it('lets a buyer invite only shops that can make the die, and only those see it', async () => {
    const buyer = await as('maya@larkspur.example');
    const title = `Invited carton ${Date.now()}`;
    const id = await postRequest(buyer, title, {
      // A counter is wanted; in the demo, Cedar Bend says it makes none (apps/api/db/seeds/demoPeople.ts).
      onJobStep: async (p) => {
        await p.locator('text=Counter (make-ready) wanted').click();
      },
      onPressStep: async (p) => {
        await p.locator('text=Only the shops I invite').click();
        // Other tests add shops of their own: the demo's are found by name.
        const find = (name: string) =>
          p.locator('[data-test=find-shop] input, input[data-test=find-shop]').first().fill(name);
        await find('Cedar Bend');
        await expect.poll(() => p.locator('[data-test=show-all-shops]').count()).toBe(1);
        expect(await choices(p).count()).toBe(0);
        await p.locator('[data-test=show-all-shops]').click();
        await expect
          .poll(() => choice(p, 'Cedar Bend Die Works').innerText())
          .toContain('Cannot make this die: makes no counters');
        // Showing more shops is no answer to the field: no error for it yet.
        expect(await p.locator('text=Invite at least one die shop').count()).toBe(0);
        await find('Brightline');
        expect(await p.locator('[data-test=shops-checked-against]').innerText()).toContain('a counter');
        await expect.poll(() => choice(p, 'Brightline Rule & Die').innerText()).toMatch(/\d+ mi away/);
        await screenshot(p, '30-invite-shops');
        await choice(p, 'Brightline Rule & Die').locator('input[type=checkbox]').check();
      },
      onDielineStep: async (p) => {
        // Back on the press step, the measured board counts too.
        await p.locator('.steps >> text=Press and dates').click();
        await expect
          .poll(() => p.locator('[data-test=shops-checked-against]').innerText())
          .toMatch(/a [\d.]+ × [\d.]+ in board/);
        await p.locator('.steps >> text=Dieline').click();
      },
    });
    await expect.poll(() => buyer.locator('main').innerText()).toContain('Brightline Rule & Die');

    const invited = await as('grace@brightline.example');
    await invited.goto(`${baseUrl}/requests/${id}`);
    await expect.poll(() => invited.locator('main').innerText()).toContain(title);
    const other = await as('lena@cedarbend.example');
    await other.goto(`${baseUrl}/open-requests`);
    await expect.poll(() => other.locator('main').innerText()).not.toContain('Loading');
    expect(await other.locator('main').innerText()).not.toContain(title);
    await other.goto(`${baseUrl}/requests/${id}`);
    await expect.poll(() => other.locator('main').innerText()).not.toContain(title);
  });
});
