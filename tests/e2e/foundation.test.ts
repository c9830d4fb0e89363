import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, latestEmail, launch, screenshot, signIn } from './browser';

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

async function freshPage(viewport = { width: 1366, height: 860 }): Promise<Page> {
  const context = await browser.newContext({ viewport });
  const p = await context.newPage();
  p.on('pageerror', (error) => {
    throw error;
  });
  return p;
}

describe('sign-in and roles in the browser', () => {
  it('shows the sign-in page and refuses a wrong password with a clear message', async () => {
    page = await freshPage();
    await page.goto(baseUrl);
    await page.waitForURL('**/sign-in');
    await screenshot(page, '01-sign-in');
    await signIn(page, 'maya@larkspur.example', 'not her password');
    await expect.poll(() => page.locator('[data-test=sign-in-error]').textContent()).toContain('do not match');
    // The page uses Work Sans, shipped with the app.
    const font = await page.evaluate(() => getComputedStyle(document.querySelector('.ant-btn')!).fontFamily);
    expect(font).toContain('Work Sans');
  });

  it('signs a print buyer in to a home page with the printer’s navigation', async () => {
    page = await freshPage();
    await signIn(page, 'maya@larkspur.example');
    await page.waitForURL(`${baseUrl}/`);
    await expect.poll(() => page.locator('[data-test=org-name]').textContent()).toBe('Larkspur Press & Carton');
    await expect.poll(() => page.locator('.page-title').textContent()).toContain('Maya');
    const nav = await page.locator('[data-test=nav]').innerText();
    expect(nav).toContain('Presses');
    await screenshot(page, '02-buyer-home');
    await page.locator('[data-test=nav] >> text=Presses').click();
    await expect.poll(() => page.locator('[data-test=presses-table]').innerText()).toContain('Platen 1');
    // A buyer reads presses but does not edit them.
    expect(await page.locator('[data-test=add-press]').count()).toBe(0);
  });

  it('gives a die-shop estimator no printer pages, even by address', async () => {
    page = await freshPage();
    await signIn(page, 'grace@brightline.example');
    await page.waitForURL(`${baseUrl}/`);
    await expect.poll(() => page.locator('[data-test=org-name]').textContent()).toBe('Brightline Rule & Die');
    expect(await page.locator('[data-test=nav]').innerText()).not.toContain('Presses');
    await page.goto(`${baseUrl}/presses`);
    await page.waitForURL(`${baseUrl}/`);
    await screenshot(page, '03-estimator-home');
  });

  it('lets a printer admin add a press, with validation messages', async () => {
    page = await freshPage();
    await signIn(page, 'priya@larkspur.example');
    await page.waitForURL(`${baseUrl}/`);
    await page.goto(`${baseUrl}/presses`);
    await page.locator('[data-test=add-press]').click();
    await page.locator('[data-test=press-save]').click();
    await expect.poll(() => page.locator('.ant-form-item-explain-error').count()).toBeGreaterThan(3);
    await page.waitForTimeout(400); // let the messages finish their entrance
    await screenshot(page, '04-press-form-errors');
    const name = `Platen E2E ${Date.now() % 100000}`;
    await page.locator('[data-test=press-name]').fill(name);
    await page.locator('[data-test=press-kind]').click();
    await page.locator('.ant-select-item-option >> text=Platen').click();
    await page.locator('[data-test=press-width] input, input[data-test=press-width]').first().fill('22');
    await page.locator('[data-test=press-length] input, input[data-test=press-length]').first().fill('30');
    await page.locator('[data-test=press-typical] input, input[data-test=press-typical]').first().fill('5000');
    await page.locator('[data-test=press-max] input, input[data-test=press-max]').first().fill('7800');
    await page.locator('[data-test=press-save]').click();
    await expect.poll(() => page.locator('[data-test=presses-table]').innerText()).toContain(name);
    await screenshot(page, '05-presses');
  });

  it('invites a new estimator by e-mail; the link sets a password and signs them in', async () => {
    page = await freshPage();
    await signIn(page, 'ken@brightline.example');
    await page.waitForURL(`${baseUrl}/`);
    await page.goto(`${baseUrl}/team`);
    await page.locator('[data-test=invite]').click();
    const email = `new-estimator-${Date.now()}@brightline.example`;
    await page.locator('[data-test=invite-name]').fill('Noor Haddad');
    await page.locator('[data-test=invite-email]').fill(email);
    await page.locator('[data-test=invite-role]').click();
    await page.locator('.ant-select-item-option >> text=Estimator').click();
    await page.locator('[data-test=invite-send]').click();
    await expect.poll(() => page.locator('[data-test=invitations-table]').innerText()).toContain(email);
    await screenshot(page, '06-team-admin');

    const message = await latestEmail(email);
    const link = /(http\S+accept-invitation\?token=\S+)/.exec(message.text)![1]!;
    const invitee = await freshPage({ width: 820, height: 1000 });
    await invitee.goto(link);
    await expect.poll(() => invitee.locator('h2').textContent()).toContain('Brightline Rule & Die');
    await invitee
      .locator('[data-test=new-password] input, input[data-test=new-password]')
      .first()
      .fill('noor chooses a password');
    await invitee
      .locator('[data-test=confirm-password] input, input[data-test=confirm-password]')
      .first()
      .fill('noor chooses a password');
    await screenshot(invitee, '07-accept-invitation-tablet');
    await invitee.locator('[data-test=accept]').click();
    await invitee.waitForURL(`${baseUrl}/`);
    await expect.poll(() => invitee.locator('.page-title').textContent()).toContain('Noor');

    // Sign-out really ends the session: the old token no longer opens the app.
    await invitee.locator('[data-test=user-menu]').hover();
    await invitee.locator('[data-test=sign-out]').click();
    await invitee.waitForURL('**/sign-in');
    await invitee.goto(`${baseUrl}/team`);
    await invitee.waitForURL('**/sign-in**');
  });
});
