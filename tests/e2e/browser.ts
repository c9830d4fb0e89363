import { mkdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';

export const baseUrl = process.env.APP_URL ?? 'http://127.0.0.1:4200';
export const mailUrl = process.env.MAIL_CATCHER_URL ?? 'http://127.0.0.1:4280';
const screenshotDir = process.env.SCREENSHOT_DIR ?? path.join(os.tmpdir(), 'kerfmark-screenshots');
export const DEMO_PASSWORD = 'kerfmark-demo-2026';

/**
 * Debian's Chromium, headless, with the flags that keep it off the (closed) network; Playwright
 * gives it a fresh, empty profile folder of its own.
 */
export async function launch(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** One Chromium for a test file: launched before its tests and closed after them; call it inside a test. */
export function browserForFile(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('Chromium is not running: call the browser inside a test');
    return browser;
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(screenshotDir, { recursive: true });
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.locator('[data-test=email]').fill(email);
  await page.locator('[data-test=password] input, input[data-test=password]').first().fill(password);
  await page.locator('[data-test=sign-in]').click();
}

/**
 * A page of its own (a fresh browser context) signed in as the user, on the home page, at a
 * width; the browser's own time zone may be set, to show that the app does not follow it.
 */
export async function pageAs(browser: Browser, email: string, width = 1366, timezoneId?: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 }, acceptDownloads: true, timezoneId });
  const p = await context.newPage();
  await signIn(p, email);
  await p.waitForURL(`${baseUrl}/`);
  return p;
}

/** The newest e-mail to an address at the mail catcher. */
export async function latestEmail(to: string, timeoutMs = 15_000): Promise<{ subject: string; text: string }> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${mailUrl}/api/messages?to=${encodeURIComponent(to)}`);
    const messages = (await res.json()) as Array<{ subject: string; text: string }>;
    if (messages.length) return messages[0]!;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no e-mail to ${to}`);
}
