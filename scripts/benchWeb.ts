// Benchmark: the web app's first load. (1) The entry that index.html loads (its module script, the
// chunks it preloads and its stylesheet), raw and gzip; (2) the open-requests board in headless
// Chromium: navigation start to the first table row on screen, cold (a new browser context per
// run, so an empty cache), median of N runs.
//
// scripts/benchApi.ts calls the exported functions over its data set. On its own, against a running app:
//   BENCH_WEB_URL=http://127.0.0.1:4100 node node_modules/tsx/dist/cli.mjs scripts/benchWeb.ts
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { constants, gzipSync } from 'node:zlib';
import { DEMO_PASSWORD, launch } from '../tests/e2e/browser';
import { repoRoot } from './lib/profile';
import { ensureDebianPackage } from './lib/system';

/** kB as Vite's build report counts them (1,000 bytes), so the figures compare with its output. */
const KB = 1000;
export const ENTRY_GZIP_TARGET_BYTES = 250 * KB;
const ROW = '[data-test="marketplace-table"] tr.ant-table-row';
const FIRST_ROW_MARK = 'bench:board-first-row';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const gzipBytes = (data: Buffer) => gzipSync(data, { level: constants.Z_BEST_COMPRESSION }).length;

export interface EntryFile {
  file: string;
  kind: 'script' | 'modulepreload' | 'static import' | 'stylesheet';
  raw: number;
  gzip: number;
}

export interface EntryChunk {
  files: EntryFile[];
  jsRaw: number;
  jsGzip: number;
  cssRaw: number;
  cssGzip: number;
  raw: number;
  gzip: number;
}

/** The attributes of every <script> and <link> tag in a page Vite generated. */
function tags(html: string): Array<{ tag: string; attrs: Record<string, string> }> {
  return [...html.matchAll(/<(script|link)\b([^>]*)>/gi)].map((m) => ({
    tag: m[1]!.toLowerCase(),
    attrs: Object.fromEntries(
      [...m[2]!.matchAll(/([\w-]+)(?:="([^"]*)")?/g)].map((a) => [a[1]!.toLowerCase(), a[2] ?? '']),
    ),
  }));
}

/** The chunks a built ES module imports statically (`import … from "./x.js"`, `import "./x.js"`). */
function staticImports(code: string): string[] {
  return [...code.matchAll(/\b(?:from|import)\s*["']\.\/([^"']+\.js)["']/g)].map((m) => m[1]!);
}

/**
 * The entry the browser needs before the app can start: the module script index.html names, the
 * chunks it preloads, any further chunk they import statically (Vite preloads them all, so this
 * should add none), and the entry stylesheet. Sizes raw and gzip at level 9 (node:zlib), which is
 * what a static server or CDN that compresses would send; the API's express.static sends them raw.
 */
export async function measureEntryChunk(distDir: string): Promise<EntryChunk> {
  const indexPath = path.join(distDir, 'index.html');
  if (!existsSync(indexPath))
    throw new Error(`${indexPath} is missing: build the web app first (npx turbo run build --filter=@kerfmark/web)`);
  const html = await readFile(indexPath, 'utf8');
  const local = (href: string) => path.join(distDir, new URL(href, 'http://app/').pathname);
  const wanted = new Map<string, EntryFile['kind']>();
  for (const { tag, attrs } of tags(html)) {
    if (tag === 'script' && attrs.type === 'module' && attrs.src) wanted.set(local(attrs.src), 'script');
    else if (tag === 'link' && attrs.rel === 'modulepreload' && attrs.href)
      wanted.set(local(attrs.href), 'modulepreload');
    else if (tag === 'link' && attrs.rel === 'stylesheet' && attrs.href) wanted.set(local(attrs.href), 'stylesheet');
  }
  if (![...wanted.values()].includes('script')) throw new Error(`${indexPath} has no <script type="module" src>`);

  const files: EntryFile[] = [];
  const queue = [...wanted.keys()];
  for (let file = queue.shift(); file !== undefined; file = queue.shift()) {
    const data = await readFile(file);
    const kind = wanted.get(file)!;
    files.push({ file: path.relative(distDir, file), kind, raw: data.length, gzip: gzipBytes(data) });
    if (kind === 'stylesheet') continue;
    for (const name of staticImports(data.toString('utf8'))) {
      const dep = path.join(path.dirname(file), name);
      if (!wanted.has(dep)) {
        wanted.set(dep, 'static import');
        queue.push(dep);
      }
    }
  }
  const sum = (list: EntryFile[], key: 'raw' | 'gzip') => list.reduce((total, f) => total + f[key], 0);
  const js = files.filter((f) => f.kind !== 'stylesheet');
  const css = files.filter((f) => f.kind === 'stylesheet');
  return {
    files,
    jsRaw: sum(js, 'raw'),
    jsGzip: sum(js, 'gzip'),
    cssRaw: sum(css, 'raw'),
    cssGzip: sum(css, 'gzip'),
    raw: sum(files, 'raw'),
    gzip: sum(files, 'gzip'),
  };
}

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
  const board = resources.find((r) => new URL(r.name).pathname === '/api/marketplace/requests');
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
