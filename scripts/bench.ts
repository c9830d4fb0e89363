// `npm run bench`: the benchmarks, one after another. Never part of `npm test`.
import { spawnSync } from 'node:child_process';
import os from 'node:os';
import path from 'node:path';
import { RESULT_PREFIX, summaryTable, type BenchResult } from './lib/benchResults';
import { repoRoot } from './lib/profile';

const benches = [
  {
    name: 'Dieline analysis (20,000-entity DXF) against the DXF parser alone',
    file: 'packages/dieline/bench/analyse.bench.ts',
  },
  {
    name: 'PDF dieline analysis (20,000 stroked paths) against pdf.js parsing the same file',
    file: 'packages/dieline/bench/pdf.bench.ts',
  },
  { name: 'Price fit in memory (100,000 records, no sampling)', file: 'packages/pricing/bench/fit.bench.ts' },
  { name: 'Price history API over 100,000 records against a bare SQL count', file: 'scripts/benchPriceHistory.ts' },
  { name: 'API under load against bare Express + pg routes, and the web app in Chromium', file: 'scripts/benchApi.ts' },
];

let failed = 0;
const results: BenchResult[] = [];
for (const bench of benches) {
  console.log(`\n== ${bench.name}\n`);
  const result = spawnSync(
    process.execPath,
    ['--expose-gc', path.join(repoRoot, 'node_modules/tsx/dist/cli.mjs'), bench.file],
    {
      cwd: repoRoot,
      stdio: ['ignore', 'pipe', 'inherit'],
      encoding: 'utf8',
      maxBuffer: 64 * 1024 * 1024,
    },
  );
  for (const line of (result.stdout ?? '').split('\n')) {
    if (line.startsWith(RESULT_PREFIX)) results.push(JSON.parse(line.slice(RESULT_PREFIX.length)) as BenchResult);
    else if (line) console.log(line);
  }
  if (result.status !== 0) failed++;
}
console.log(
  `\n== Summary (${new Date().toISOString().slice(0, 10)}, ${os.cpus().length} cores, Node ${process.version})\n`,
);
console.log(summaryTable(results));
process.exit(failed ? 1 : 0);
