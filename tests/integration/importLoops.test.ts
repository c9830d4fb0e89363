import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importGraph, importLoops, repoRoot } from './importGraph';

describe('import loops', () => {
  it('finds a loop when there is one (the check can fail)', () => {
    const graph = new Map([
      ['a', ['b']],
      ['b', ['c']],
      ['c', ['a']],
      ['d', ['a']],
    ]);
    expect(importLoops(graph).map((set) => set.sort())).toEqual([['a', 'b', 'c']]);
  });

  it('reads imports of the source, across workspace packages too', () => {
    const graph = importGraph();
    const bidTerms = path.join(repoRoot, 'apps/api/src/services/bids/bidTerms.ts');
    expect(graph.get(bidTerms)).toContain(path.join(repoRoot, 'packages/pricing/src/index.ts'));
  });

  it('no module of the project imports itself back, not even through types', () => {
    const loops = importLoops(importGraph()).map((set) => set.map((f) => path.relative(repoRoot, f)).sort());
    expect(loops).toEqual([]);
  });
});
