// Benchmark: the web app's first load. (1) The entry that index.html loads (its module script, the
// chunks it preloads and its stylesheet), raw and gzip; (2) the open requests in headless
// Chromium: navigation start to the first table row on screen, cold (a new browser context per
// run, so an empty cache), median of N runs.
//
// scripts/benchApi.ts calls the exported functions over its data set. On its own, against a running app:
//   BENCH_WEB_URL=http://127.0.0.1:4100 node node_modules/tsx/dist/cli.mjs scripts/benchWeb.ts
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { DEMO_PASSWORD, launch } from '../tests/e2e/browser';
import { repoRoot } from './lib/profile';
import { ensureDebianPackage } from './lib/system';
import { measureEntryChunk, type EntryChunk } from './lib/entryChunk';

export { measureEntryChunk, type EntryChunk };

/** kB as Vite's build report counts them (1,000 bytes), so the figures compare with its output. */
const KB = 1000;
export const ENTRY_GZIP_TARGET_BYTES = 250 * KB;
const ROW = '[data-test="open-requests-table"] tr.ant-table-row';
const FIRST_ROW_MARK = 'bench:open-requests-first-row';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export interface OpenRequestsRender {
  runs: number;
  /** Navigation start to the frame that first holds a visible open-requests row (median, ms). */
  firstRowMs: number;
  /** The browser's first-contentful-paint (median, ms). */
  fcpMs: number;
  /** DOMContentLoaded end (median, ms). */
  domContentLoadedMs: number;
  /** The open requests' API answer fully received (median, ms). */
  openRequestsApiMs: number;
  /** Bytes over the wire before the first row (median). */
  transferBytes: number;
  /** The load whose bytes are the median: what came over the wire before its first row, and what was still coming. */
  medianSample: OpenRequestsSample;
  samples: OpenRequestsSample[];
}

export interface OpenRequestsSample {
  firstRowMs: number;
  fcpMs: number;
  domContentLoadedMs: number;
  openRequestsApiMs: number;
  transferBytes: number;
  /** Each response received before the first row (the page itself first), with its bytes over the wire. */
  resources: Array<{ path: string; transferBytes: number; responseEndMs: number }>;
  /** Requests started before the first row but still arriving when it showed: not counted in transferBytes. */
  inFlight: Array<{ path: string; transferBytes: number; responseEndMs: number }>;
}

/**
 * Runs in the page before its own scripts: marks the first frame in which an open-requests row is in the
 * document with a layout box (the same test of visibility Playwright uses). Functions sent to the
 * page must not declare named functions inside: tsx adds `__name()` calls the page lacks.
 */
function markFirstRow([selector, mark]: [string, string]) {
  new MutationObserver((_, observer) => {
    if (!document.querySelector(selector)?.checkVisibility({ visibilityProperty: true })) return;
    observer.disconnect();
    requestAnimationFrame(() => performance.mark(mark));
  }).observe(document, { childList: true, subtree: true });
}

/** The timings of one load, read in the page once the row is marked. */
function readTimings(mark: string) {
  const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined;
  const fcp = performance.getEntriesByName('first-contentful-paint')[0];
  const firstRow = performance.getEntriesByName(mark)[0]!.startTime;
  const resources = performance.getEntriesByType('resource') as PerformanceResourceTiming[];
  const answer = resources.find((r) => new URL(r.name).pathname === '/api/open-requests');
  const before = resources.filter((r) => r.responseEnd <= firstRow);
  const inFlight = resources.filter((r) => r.startTime < firstRow && r.responseEnd > firstRow);
  return {
    firstRowMs: firstRow,
    fcpMs: fcp?.startTime ?? Number.NaN,
    domContentLoadedMs: nav?.domContentLoadedEventEnd ?? Number.NaN,
    openRequestsApiMs: answer?.responseEnd ?? Number.NaN,
    transferBytes: (nav?.transferSize ?? 0) + before.reduce((total, r) => total + r.transferSize, 0),
    resources: [
      { path: location.pathname, transferBytes: nav?.transferSize ?? 0, responseEndMs: nav?.responseEnd ?? 0 },
      ...before.map((r) => ({
        path: new URL(r.name).pathname,
        transferBytes: r.transferSize,
        responseEndMs: r.responseEnd,
      })),
    ],
    inFlight: inFlight.map((r) => ({
      path: new URL(r.name).pathname,
      transferBytes: r.transferSize,
      responseEndMs: r.responseEnd,
    })),
  };
}

/**
 * Signs in once through the sign-in page (the app keeps its token in localStorage), then loads the
 * open requests `runs` times, each in a new browser context carrying only that storage.
 */
export async function measureOpenRequestsRender(
  appUrl: string,
  credentials: { email: string; password: string },
  runs = 5,
): Promise<OpenRequestsRender> {
  if (!Number.isInteger(runs) || runs < 1) throw new Error(`runs must be a whole number of at least 1, not ${runs}`);
  if (!process.env.CHROMIUM_PATH)
    ensureDebianPackage('/usr/bin/chromium', 'chromium', 'The open-requests render benchmark (headless Chromium)');
  const origin = new URL(appUrl).origin;
  const browser = await launch();
  try {
    const signIn = await browser.newContext({ viewport: { width: 1366, height: 900 } });
    const page = await signIn.newPage();
    await page.goto(`${origin}/sign-in`);
    await page.locator('[data-test=email]').fill(credentials.email);
    await page.locator('[data-test=password] input, input[data-test=password]').first().fill(credentials.password);
    await page.locator('[data-test=sign-in]').click();
    await page.waitForURL(`${origin}/`, { timeout: 15_000 }).catch(() => {
      throw new Error(`signing in as ${credentials.email} at ${origin} did not reach the home page`);
    });
    const storageState = await signIn.storageState();
    await signIn.close();

    const samples: OpenRequestsSample[] = [];
    for (let i = 0; i < runs; i++) {
      const context = await browser.newContext({ viewport: { width: 1366, height: 900 }, storageState });
      try {
        await context.addInitScript(markFirstRow, [ROW, FIRST_ROW_MARK] as [string, string]);
        const page = await context.newPage();
        await page.goto(`${origin}/open-requests`, { waitUntil: 'commit' });
        await page
          .waitForFunction((mark) => performance.getEntriesByName(mark).length > 0, FIRST_ROW_MARK, { timeout: 30_000 })
          .catch(() => {
            throw new Error(
              `no open-requests row appeared within 30 s (the page is at ${page.url()}); does ${credentials.email} see open requests?`,
            );
          });
        samples.push(await page.evaluate(readTimings, FIRST_ROW_MARK));
      } finally {
        await context.close();
      }
    }
    const med = (key: 'firstRowMs' | 'fcpMs' | 'domContentLoadedMs' | 'openRequestsApiMs' | 'transferBytes') =>
      median(samples.map((s) => s[key]));
    return {
      runs,
      firstRowMs: med('firstRowMs'),
      fcpMs: med('fcpMs'),
      domContentLoadedMs: med('domContentLoadedMs'),
      openRequestsApiMs: med('openRequestsApiMs'),
      transferBytes: med('transferBytes'),
      medianSample: samples.find((s) => s.transferBytes === med('transferBytes'))!,
      samples,
    };
  } finally {
    await browser.close();
  }
}

const kb = (bytes: number) => `${(bytes / KB).toFixed(1)} kB`;
const ms = (value: number) => `${value.toFixed(0)} ms`;

export const WEB_TABLE_HEADER = [
  '| web figure                             | value     | note                                    |',
  '|----------------------------------------|-----------|-----------------------------------------|',
];

/** Table rows for the web figures, in the shape of the bench's other tables. */
export function formatWebRows(entry: EntryChunk, openRequests?: OpenRequestsRender): string[] {
  const row = (figure: string, value: string, note: string) =>
    `| ${figure.padEnd(38)} | ${value.padStart(9)} | ${note.padEnd(39)} |`;
  const rows = [
    row(
      'entry JS + CSS, gzip -9',
      kb(entry.gzip),
      `target < ${kb(ENTRY_GZIP_TARGET_BYTES)}: ${entry.gzip < ENTRY_GZIP_TARGET_BYTES ? 'met' : 'MISSED'}`,
    ),
    row(
      'entry JS + CSS, raw (as served)',
      kb(entry.raw),
      `${entry.files.length} files; JS ${kb(entry.jsGzip)} gzip, CSS ${kb(entry.cssGzip)}`,
    ),
  ];
  if (openRequests) {
    const note = `median of ${openRequests.runs} cold loads`;
    rows.push(
      row('open requests: first row visible', ms(openRequests.firstRowMs), note),
      row('open requests: first-contentful-paint', ms(openRequests.fcpMs), note),
      row('open requests: DOMContentLoaded', ms(openRequests.domContentLoadedMs), note),
      row('open requests: API answer received', ms(openRequests.openRequestsApiMs), note),
      row(
        'open requests: bytes before first row',
        kb(openRequests.transferBytes),
        'over the wire, as the server sends them',
      ),
    );
  }
  return rows;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  try {
    const entry = await measureEntryChunk(process.env.BENCH_WEB_DIST ?? path.join(repoRoot, 'apps/web/dist'));
    const appUrl = process.env.BENCH_WEB_URL;
    const openRequests = appUrl
      ? await measureOpenRequestsRender(
          appUrl,
          {
            email: process.env.BENCH_WEB_EMAIL ?? 'grace@brightline.example',
            password: process.env.BENCH_WEB_PASSWORD ?? DEMO_PASSWORD,
          },
          Number(process.env.BENCH_WEB_RUNS ?? 5),
        )
      : undefined;
    for (const f of entry.files)
      console.log(
        `  ${f.kind.padEnd(14)} ${f.file.padEnd(44)} ${kb(f.raw).padStart(9)} raw ${kb(f.gzip).padStart(9)} gzip`,
      );
    if (openRequests) {
      console.log(
        `  before the first row (the load with the median bytes, first row at ${ms(openRequests.medianSample.firstRowMs)}):`,
      );
      for (const r of [...openRequests.medianSample.resources].sort((a, b) => b.transferBytes - a.transferBytes))
        console.log(`    ${kb(r.transferBytes).padStart(9)}  ${r.path}`);
      for (const r of openRequests.medianSample.inFlight)
        console.log(
          `    ${kb(r.transferBytes).padStart(9)}  ${r.path} (still arriving, ended at ${ms(r.responseEndMs)}; not counted)`,
        );
    } else console.log('  (set BENCH_WEB_URL to a running app to time the open requests too)');
    console.log([...WEB_TABLE_HEADER, ...formatWebRows(entry, openRequests)].join('\n'));
  } catch (error) {
    console.error(`benchmark failed: ${(error as Error).stack}`);
    process.exitCode = 1;
  }
}
