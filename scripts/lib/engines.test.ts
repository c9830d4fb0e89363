import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot } from './profile';

interface Manifest {
  name: string;
  engines?: { node?: string };
  workspaces?: string[];
}
const read = (file: string) => JSON.parse(readFileSync(path.join(repoRoot, file), 'utf8')) as Manifest;

describe('the Node versions the project runs on', () => {
  // Node 20 (20.19 and later) and Node 22 LTS from 22.13, the lowest 22.x that eslint 10 accepts
  // (its engines: ^20.19.0 || ^22.13.0 || >=24, in package-lock.json).
  const root = read('package.json');
  const lock = JSON.parse(readFileSync(path.join(repoRoot, 'package-lock.json'), 'utf8')) as {
    packages: Record<string, Manifest>;
  };

  it('the root declares them, and the lock file records the same', () => {
    expect(root.engines?.node).toBe('>=20.19 <21 || >=22.13');
    expect(lock.packages['']!.engines?.node).toBe(root.engines?.node);
  });

  it('no workspace asks for anything else', () => {
    const workspaces = Object.entries(lock.packages).filter(
      ([key, entry]) => key && !key.includes('node_modules') && entry.name?.startsWith('@kerfmark/'),
    );
    expect(workspaces.length).toBeGreaterThan(5);
    for (const [key] of workspaces) {
      const own = read(`${key}/package.json`).engines?.node;
      expect(own === undefined || own === root.engines?.node, `${key} engines: ${own}`).toBe(true);
    }
  });
});
