// Every workspace declares what it imports, at an exact version, and what production runs is
// never a dev dependency; the local fakes and the browser driver stay out of a production
// install (`npm ci --omit=dev`). Read from the files themselves, so a new import that is not
// declared fails here naming the file.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { builtinModules } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

interface Manifest {
  name: string;
  dependencies?: Record<string, string>;
  devDependencies?: Record<string, string>;
}

/** Workspaces whose non-test code runs in production: there, imports must be `dependencies`. */
const RUNS_IN_PRODUCTION = new Set([
  'apps/api',
  'apps/worker',
  'packages/contracts',
  'packages/dieline',
  'packages/notices',
  'packages/pricing',
  'packages/stock',
  'packages/storage',
]);
const SKIP_DIRS = new Set(['node_modules', 'dist', '.data', '.turbo', 'coverage', 'fixtures', 'bench-data']);
const SOURCE = /\.(ts|mts|js|mjs|vue)$/;

function workspaces(): string[] {
  const top = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8')) as { workspaces: string[] };
  return top.workspaces
    .flatMap((pattern) =>
      pattern.endsWith('/*')
        ? readdirSync(path.join(root, pattern.slice(0, -2))).map((name) => `${pattern.slice(0, -2)}/${name}`)
        : [pattern],
    )
    .filter((dir) => statSync(path.join(root, dir, 'package.json'), { throwIfNoEntry: false }));
}

function sourceFiles(dir: string, nested: string[]): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return SKIP_DIRS.has(entry.name) || nested.includes(full) ? [] : sourceFiles(full, nested);
    return SOURCE.test(entry.name) && !entry.name.endsWith('.d.ts') ? [full] : [];
  });
}

/** The package names a file imports: `import … from 'x'`, `import 'x'`, `import('x')`, `export … from 'x'`. */
export function importedPackages(text: string): string[] {
  const names = new Set<string>();
  const pattern =
    /^\s*(?:import|export)\b[^'"`;]*?from\s*['"]([^'"]+)['"]|^\s*import\s*['"]([^'"]+)['"]|\bimport\(\s*['"]([^'"]+)['"]\s*\)/gm;
  for (const match of text.matchAll(pattern)) {
    const spec = match[1] ?? match[2] ?? match[3]!;
    if (spec.startsWith('.') || spec.startsWith('/') || spec.startsWith('node:') || spec.startsWith('virtual:'))
      continue;
    const name = spec.startsWith('@') ? spec.split('/').slice(0, 2).join('/') : spec.split('/')[0]!;
    if (!builtinModules.includes(name)) names.add(name);
  }
  return [...names];
}

const isTestCode = (file: string) =>
  /\.test\.ts$|[/\\]testing[/\\]|[/\\]test[/\\]|[/\\]bench[/\\]|vitest\.config|vite\.config|eslint\.config/.test(file);

describe('dependencies', () => {
  const dirs = ['.', ...workspaces()];
  const manifests = new Map(
    dirs.map((dir) => [dir, JSON.parse(readFileSync(path.join(root, dir, 'package.json'), 'utf8')) as Manifest]),
  );

  it('reads import forms the scan must see (arithmetic on a sample)', () => {
    const sample =
      "import a from 'alpha';\nimport { b } from '@scope/beta/sub';\nimport 'gamma';\nexport { d } from 'delta';\nconst e = await import('epsilon');\nimport x from './local';\nimport fs from 'node:fs';\nimport path from 'path';";
    expect(importedPackages(sample).sort()).toEqual(['@scope/beta', 'alpha', 'delta', 'epsilon', 'gamma']);
  });

  it('declares every import in the workspace that makes it, production code in dependencies', () => {
    const problems: string[] = [];
    for (const dir of dirs) {
      const manifest = manifests.get(dir)!;
      const nested = dir === '.' ? dirs.filter((d) => d !== '.').map((d) => path.join(root, d)) : [];
      for (const file of sourceFiles(path.join(root, dir), nested)) {
        const rel = path.relative(root, file);
        if (file === fileURLToPath(import.meta.url)) continue; // its sample imports are text, not imports
        for (const name of importedPackages(readFileSync(file, 'utf8'))) {
          if (name === manifest.name) continue;
          const inDeps = name in (manifest.dependencies ?? {});
          const inDev = name in (manifest.devDependencies ?? {});
          if (!inDeps && !inDev) problems.push(`${rel} imports ${name}, which ${dir}/package.json does not declare`);
          else if (!inDeps && RUNS_IN_PRODUCTION.has(dir) && !isTestCode(rel))
            problems.push(`${rel} runs in production but ${name} is only a dev dependency of ${dir}`);
        }
      }
    }
    expect(problems).toEqual([]);
  });

  it('pins every external dependency to an exact version', () => {
    const ranges = [...manifests].flatMap(([dir, m]) =>
      Object.entries({ ...m.dependencies, ...m.devDependencies })
        .filter(([name, version]) => !name.startsWith('@kerfmark/') && !/^\d+\.\d+\.\d+(-[\w.]+)?$/.test(version))
        .map(([name, version]) => `${dir}: ${name}@${version}`),
    );
    expect(ranges).toEqual([]);
  });

  it('keeps the local fakes and the browser driver out of a production install', () => {
    // package-lock.json marks every package that only dev dependencies reach with "dev": true;
    // `npm ci --omit=dev` installs exactly the others.
    const lock = JSON.parse(readFileSync(path.join(root, 'package-lock.json'), 'utf8')) as {
      packages: Record<string, { dev?: boolean }>;
    };
    const production = Object.entries(lock.packages)
      .filter(([key, entry]) => key.includes('node_modules/') && !entry.dev)
      .map(([key]) => key.split('node_modules/').pop()!);
    for (const devOnly of [
      's3rver',
      'smtp-server',
      'mailparser',
      'playwright-core',
      'vitest',
      'supertest',
      'ioredis-mock',
    ]) {
      expect(production, devOnly).not.toContain(devOnly);
    }
    for (const runs of ['express', 'knex', 'bullmq', 'tsx', 'pdfkit']) expect(production, runs).toContain(runs);
  });
});
