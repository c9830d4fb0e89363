import { describe, expect, it } from 'vitest';
import { baseUrl, browserForFile, pageAs, screenshot } from './browser';

const browser = browserForFile();

const as = (email: string, width?: number) => pageAs(browser(), email, width);

describe('the organisation profile', () => {
  it('lets the printer’s admin change the payment terms and keeps them', async () => {
    const admin = await as('priya@larkspur.example');
    await admin.locator('[data-test=nav] >> text=Organisation profile').click();
    // The demo scenario's profile (apps/api/db/seeds/demoPeople.ts).
    await expect
      .poll(() => admin.locator('[data-test=profile-legal-name]').inputValue())
      .toBe('Larkspur Press & Carton Co.');
    const terms = admin.locator('[data-test=profile-payment-terms] input');
    await terms.fill('Net 45');
    await admin.locator('[data-test=profile-save]').click();
    await expect.poll(() => admin.locator('.ant-message').innerText()).toContain('Profile saved');
    await admin.reload();
    await expect.poll(() => admin.locator('[data-test=profile-payment-terms] input').inputValue()).toBe('Net 45');
    await screenshot(admin, '24-organisation-profile');
    await admin.locator('[data-test=profile-payment-terms] input').fill('Net 30');
    await admin.locator('[data-test=profile-save]').click();
    await expect.poll(() => admin.locator('.ant-message').innerText()).toContain('Profile saved');
  });

  it('shows a buyer the profile read-only, reached from the organisation’s name', async () => {
    const buyer = await as('maya@larkspur.example', 390);
    // At a phone's width the navigation is a drawer behind the menu button.
    expect(await buyer.locator('[data-test=nav]').count()).toBe(0);
    await buyer.locator('[data-test=menu-button]').click();
    const nav = buyer.locator('.ant-drawer [data-test=nav]');
    await expect.poll(() => nav.innerText()).toContain('Die requests');
    expect(await nav.innerText()).not.toContain('Organisation profile');
    await buyer.keyboard.press('Escape');
    await buyer.locator('[data-test=org-name]').click();
    await buyer.waitForURL(`${baseUrl}/profile`);
    await expect.poll(() => buyer.locator('[data-test=profile-read-only]').isVisible()).toBe(true);
    expect(await buyer.locator('[data-test=profile-form]').count()).toBe(0);
    expect(await buyer.locator('[data-test=delivery-points]').innerText()).toContain('Main plant, dock 2');
    await screenshot(buyer, '25-organisation-profile-phone');
  });

  it('shows a die shop’s estimator its capabilities', async () => {
    const estimator = await as('chidi@okafor.example');
    await estimator.goto(`${baseUrl}/profile`);
    const capabilities = estimator.locator('[data-test=profile-capabilities]');
    await expect.poll(() => capabilities.innerText()).toContain('Flat, Rotary');
    expect(await capabilities.innerText()).toContain('0.937 in');
  });
});
