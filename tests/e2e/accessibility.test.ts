import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Me } from '@kerfmark/contracts';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { canAccess } from '../../apps/web/src/router/access';
import { appRoutes } from '../../apps/web/src/router/appRoutes';
import { publicRoutes } from '../../apps/web/src/router/publicRoutes';
import { baseUrl, browserForFile, pageAs } from './browser';

// axe-core, Deque's accessibility engine, run in the page with the WCAG 2.0 and 2.1 A and AA rules.
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const WCAG_21_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];
const WIDTHS = [1440, 390];

interface Finding {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/** The serious and critical WCAG 2.1 AA violations axe finds on the page as it stands. */
async function violations(p: Page): Promise<Finding[]> {
  if (!(await p.evaluate(() => 'axe' in window))) await p.evaluate(axeSource);
  return p.evaluate(async (tags) => {
    const axe = (window as unknown as { axe: { run: (c: Document, o: object) => Promise<{ violations: never[] }> } })
      .axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations'] });
    return (
      result.violations as Array<{
        id: string;
        impact: string | null;
        help: string;
        nodes: Array<{ target: string[] }>;
      }>
    )
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({ id: v.id, impact: v.impact, help: v.help, targets: v.nodes.map((n) => n.target.join(' ')) }));
  }, WCAG_21_AA);
}

/** Waits until the page has loaded what it shows: no request running, no skeleton left. */
async function settled(p: Page) {
  await p.waitForLoadState('networkidle');
  await expect.poll(() => p.locator('.ant-skeleton, .ant-spin-spinning').count(), { timeout: 15_000 }).toBe(0);
  await p.waitForTimeout(300); // transitions
}

/** What an API route answers the signed-in user, with the page's own session. */
async function apiGet<T>(p: Page, path: string): Promise<T> {
  return p.evaluate(async (url) => {
    const { token } = JSON.parse(localStorage.getItem('kerfmark.session') ?? '{}') as { token?: string };
    return (await fetch(url, { headers: { Authorization: `Bearer ${token}` } })).json();
  }, path);
}

/** The id of the first item an API list gives the signed-in user. */
async function firstId(p: Page, path: string): Promise<number> {
  const body = await apiGet<{ items?: Array<{ id: number }> } | Array<{ id: number }>>(p, path);
  const id = (Array.isArray(body) ? body : (body.items ?? []))[0]?.id;
  if (!id) throw new Error(`${path} gave no item to visit`);
  return id;
}

const meOf = (p: Page) => apiGet<Me>(p, '/api/me');

/**
 * How to reach each route as a signed-in user, and the dialogs it opens; every route of the app
 * needs an entry (the guard below), so a new page is checked from the day it is added.
 */
const signedInVisits: Record<string, (p: Page, me: Me) => Promise<string>> = {
  home: async () => '/',
  requests: async () => '/requests',
  'request-new': async () => '/requests/new',
  'request-edit': async (p) => `/requests/${await firstId(p, '/api/requests?status=draft')}/edit`,
  request: async (p, me) =>
    `/requests/${await firstId(p, me.organisation.kind === 'printer' ? '/api/requests?status=open' : '/api/open-requests')}`,
  'price-history': async () => '/price-history',
  library: async () => '/library',
  'open-requests': async () => '/open-requests',
  notifications: async () => '/notifications',
  'rate-card': async () => '/rate-card',
  holidays: async () => '/holidays',
  team: async () => '/team',
  presses: async () => '/presses',
  profile: async () => '/profile',
};
const publicVisits: Record<string, string> = {
  'sign-in': '/sign-in',
  'accept-invitation': '/accept-invitation?token=not-a-real-invitation',
  'not-found': '/no-such-page',
};

/** Buttons that open a dialog, by route: the dialog is checked open. */
const dialogs: Record<string, string[]> = {
  presses: ['[data-test=add-press]'],
  team: ['[data-test=invite]'],
  'price-history': ['[data-test=import]'],
};

// One of every role, at a printer and at a die shop of the demo scenario (apps/api/db/seeds/demoPeople.ts).
const people = [
  'maya@larkspur.example',
  'daniel@larkspur.example',
  'priya@larkspur.example',
  'grace@brightline.example',
  'ken@brightline.example',
];

const browser = browserForFile();

const report = (where: string, found: Finding[]) =>
  found.map((f) => `${where}: ${f.id} (${f.impact}) ${f.help} — ${f.targets.slice(0, 4).join(' | ')}`);

describe('accessibility: WCAG 2.1 AA by axe-core', () => {
  it('has a visit for every route of the app', () => {
    const routeNames = [...appRoutes, ...publicRoutes].map((r) => String(r.name));
    const visited = [...Object.keys(signedInVisits), ...Object.keys(publicVisits)];
    expect(routeNames.filter((n) => !visited.includes(n))).toEqual([]);
    expect(visited.filter((n) => !routeNames.includes(n))).toEqual([]);
  });

  for (const width of WIDTHS) {
    it(`finds no serious or critical violation on the public pages at ${width} px`, async () => {
      const context = await browser().newContext({ viewport: { width, height: 900 } });
      const p = await context.newPage();
      const found: string[] = [];
      for (const [name, path] of Object.entries(publicVisits)) {
        await p.goto(`${baseUrl}${path}`);
        await settled(p);
        found.push(...report(`${name} ${width}px`, await violations(p)));
      }
      await context.close();
      expect(found).toEqual([]);
    });

    for (const email of people) {
      it(`finds no serious or critical violation on any page ${email} opens at ${width} px`, async () => {
        const p = await pageAs(browser(), email, width);
        const me = await meOf(p);
        const found: string[] = [];
        for (const route of appRoutes) {
          const name = String(route.name);
          if (!canAccess(me, route.meta?.access)) continue;
          await p.goto(`${baseUrl}${await signedInVisits[name]!(p, me)}`);
          await settled(p);
          found.push(...report(`${name} as ${me.role} ${width}px`, await violations(p)));
          for (const opener of dialogs[name] ?? []) {
            if ((await p.locator(opener).count()) === 0) continue; // not this role's to open
            await p.locator(opener).click();
            await p.locator('.ant-modal-content').waitFor();
            await settled(p);
            found.push(...report(`${name} ${opener} as ${me.role} ${width}px`, await violations(p)));
            await p.keyboard.press('Escape');
          }
        }
        await p.context().close();
        expect(found).toEqual([]);
      });
    }
  }
});
