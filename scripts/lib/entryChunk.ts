import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { constants, gzipSync } from 'node:zlib';

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
 * what a static server or CDN that compresses would send (the app's own server sends the brotli
 * files the build makes, smaller still).
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
