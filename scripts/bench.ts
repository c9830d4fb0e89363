// `npm run bench`: the benchmarks, one after another. Never part of `npm test`.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { repoRoot } from './lib/profile';

const benches = [
  { name: 'Dieline analysis (20,000-entity DXF) against the DXF parser alone', file: 'packages/dieline/bench/analyse.bench.ts' },
  { name: 'Price fit in memory (100,000 records, no sampling)', file: 'packages/pricing/bench/fit.bench.ts' },
  { name: 'Price history API over 100,000 records against a bare SQL count', file: 'scripts/benchPriceHistory.ts' },
  { name: 'API under load against bare Express + pg routes', file: 'scripts/benchApi.ts' },
];

let failed = 0;
for (const bench of benches) {
  console.log(`\n== ${bench.name}\n`);
  const result = spawnSync(process.execPath, ['--expose-gc', path.join(repoRoot, 'node_modules/tsx/dist/cli.mjs'), bench.file], {
    cwd: repoRoot,
    stdio: 'inherit',
  });
  if (result.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
