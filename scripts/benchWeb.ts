// Benchmark: the web app's first load. (1) The entry that index.html loads (its module script, the
// chunks it preloads and its stylesheet), raw and gzip; (2) the open-requests board in headless
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
const FIRST_ROW_MARK = 'bench:board-first-row';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export interface BoardRender {
  runs: number;
  /** Navigation start to the frame that first holds a visible board row (median, ms). */
  firstRowMs: number;
  /** The browser's first-contentful-paint (median, ms). */
  fcpMs: number;
  /** DOMContentLoaded end (median, ms). */
  domContentLoadedMs: number;
  /** The board's API answer fully received (median, ms). */
  boardApiMs: number;
  /** Bytes over the wire before the first row (median). */
  transferBytes: number;
  samples: Array<{
    firstRowMs: number;
    fcpMs: number;
    domContentLoadedMs: number;
    boardApiMs: number;
    transferBytes: number;
  }>;
}

/**
 * Runs in the page before its own scripts: marks the first frame in which a board row is in the
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
  const board = resources.find((r) => new URL(r.name).pathname === '/api/open-requests');
  const before = resources.filter((r) => r.responseEnd <= firstRow);
  return {
    firstRowMs: firstRow,
    fcpMs: fcp?.startTime ?? Number.NaN,
    domContentLoadedMs: nav?.domContentLoadedEventEnd ?? Number.NaN,
    boardApiMs: board?.responseEnd ?? Number.NaN,
    transferBytes: (nav?.transferSize ?? 0) + before.reduce((total, r) => total + r.transferSize, 0),
  };
}

/**
 * Signs in once through the sign-in page (the app keeps its token in localStorage), then loads the
 * open-requests board `runs` times, each in a new browser context carrying only that storage.
 */
export async function measureBoardRender(
  appUrl: string,
  credentials: { email: string; password: string },
  runs = 5,
): Promise<BoardRender> {
  if (!Number.isInteger(runs) || runs < 1) throw new Error(`runs must be a whole number of at least 1, not ${runs}`);
  if (!process.env.CHROMIUM_PATH)
    ensureDebianPackage('/usr/bin/chromium', 'chromium', 'The board render benchmark (headless Chromium)');
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

    const samples: BoardRender['samples'] = [];
    for (let i = 0; i < runs; i++) {
      const context = await browser.newContext({ viewport: { width: 1366, height: 900 }, storageState });
      try {
        await context.addInitScript(markFirstRow, [ROW, FIRST_ROW_MARK] as [string, string]);
        const board = await context.newPage();
        await board.goto(`${origin}/open-requests`, { waitUntil: 'commit' });
        await board
          .waitForFunction((mark) => performance.getEntriesByName(mark).length > 0, FIRST_ROW_MARK, { timeout: 30_000 })
          .catch(() => {
            throw new Error(
              `no board row appeared within 30 s (the page is at ${board.url()}); does ${credentials.email} see open requests?`,
            );
          });
        samples.push(await board.evaluate(readTimings, FIRST_ROW_MARK));
      } finally {
        await context.close();
      }
    }
    const med = (key: keyof BoardRender['samples'][number]) => median(samples.map((s) => s[key]));
    return {
      runs,
      firstRowMs: med('firstRowMs'),
      fcpMs: med('fcpMs'),
      domContentLoadedMs: med('domContentLoadedMs'),
      boardApiMs: med('boardApiMs'),
      transferBytes: med('transferBytes'),
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
export function formatWebRows(entry: EntryChunk, board?: BoardRender): string[] {
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
  if (board) {
    const note = `median of ${board.runs} cold loads`;
    rows.push(
      row('board: first row visible', ms(board.firstRowMs), note),
      row('board: first-contentful-paint', ms(board.fcpMs), note),
      row('board: DOMContentLoaded', ms(board.domContentLoadedMs), note),
      row('board: API answer received', ms(board.boardApiMs), note),
      row('board: bytes before first row', kb(board.transferBytes), 'over the wire (assets gzipped)'),
    );
  }
  return rows;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  try {
    const entry = await measureEntryChunk(process.env.BENCH_WEB_DIST ?? path.join(repoRoot, 'apps/web/dist'));
    const appUrl = process.env.BENCH_WEB_URL;
    const board = appUrl
      ? await measureBoardRender(
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
    if (!board) console.log('  (set BENCH_WEB_URL to a running app to time the board too)');
    console.log([...WEB_TABLE_HEADER, ...formatWebRows(entry, board)].join('\n'));
  } catch (error) {
    console.error(`benchmark failed: ${(error as Error).stack}`);
    process.exitCode = 1;
  }
}
