// The import graph of the project's own source, read with TypeScript's own pre-processor: every
// import and re-export (type-only ones too), relative or of a workspace package, resolved to a file.
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

export const repoRoot = path.resolve(import.meta.dirname, '../..');
const SOURCE_ROOTS = ['apps/api/src', 'apps/api/db', 'apps/web/src', 'apps/worker/src'];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (name === 'node_modules' || name === 'dist') return [];
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return /\.(ts|vue)$/.test(name) && !name.endsWith('.d.ts') ? [full] : [];
  });
}

function roots(): string[] {
  const packages = readdirSync(path.join(repoRoot, 'packages')).map((p) => `packages/${p}/src`);
  return [...SOURCE_ROOTS, ...packages].map((r) => path.join(repoRoot, r)).filter((r) => existsSync(r));
}

function resolve(from: string, specifier: string): string | null {
  let base: string;
  const workspace = /^@kerfmark\/([^/]+)$/.exec(specifier);
  if (workspace) base = path.join(repoRoot, 'packages', workspace[1]!, 'src', 'index');
  else if (specifier.startsWith('.')) base = path.resolve(path.dirname(from), specifier);
  else return null;
  for (const candidate of [base, `${base}.ts`, `${base}.vue`, path.join(base, 'index.ts')])
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  return null;
}

/** File → the project files it imports. A .vue file's imports are those of its script blocks. */
export function importGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const file of roots().flatMap(sourceFiles)) {
    let text = readFileSync(file, 'utf8');
    if (file.endsWith('.vue'))
      text = [...text.matchAll(/<script[^>]*>([\s\S]*?)<\/script>/g)].map((m) => m[1]).join('\n');
    const { importedFiles } = ts.preProcessFile(text, true, true);
    const targets = importedFiles.map((f) => resolve(file, f.fileName)).filter((t): t is string => t !== null);
    graph.set(file, [...new Set(targets)]);
  }
  return graph;
}

/** Every strongly connected set of more than one file (or a file importing itself): the import loops. */
export function importLoops(graph: Map<string, string[]>): string[][] {
  // Tarjan's algorithm (Tarjan 1972, "Depth-first search and linear graph algorithms").
  let index = 0;
  const indices = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const loops: string[][] = [];
  const visit = (v: string) => {
    indices.set(v, index);
    low.set(v, index++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!indices.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, indices.get(w)!));
    }
    if (low.get(v) === indices.get(v)) {
      const set: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        set.push(w);
      } while (w !== v);
      if (set.length > 1 || (graph.get(v) ?? []).includes(v)) loops.push(set);
    }
  };
  for (const v of graph.keys()) if (!indices.has(v)) visit(v);
  return loops;
}
