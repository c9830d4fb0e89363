// Fits 100,000 generated dies and prints the time and peak memory of each step.
// Run: npx tsx packages/pricing/bench/fit.bench.ts [records]
import { fairPriceBand, fitPrice, pricePerInch, priceTrend } from '../src/index';
import { syntheticDies } from '../src/testing/syntheticDies';

const n = Number(process.argv[2] ?? 100_000);
if (!Number.isSafeInteger(n) || n < 8)
  throw new RangeError(`Give a whole number of records of at least 8 (got ${process.argv[2]})`);

const mib = (bytes: number) => `${(bytes / 2 ** 20).toFixed(1)} MiB`;
const took: Record<string, number> = {};
function time<T>(label: string, run: () => T): T {
  const start = process.hrtime.bigint();
  const result = run();
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  took[label] = ms;
  console.log(`${label.padEnd(28)} ${ms.toFixed(1).padStart(9)} ms   heap used ${mib(process.memoryUsage().heapUsed)}`);
  return result;
}

const records = time(`generate ${n.toLocaleString('en-US')} dies`, () => syntheticDies({ n, seed: 1 }));
const fit = time('fitPrice (both models)', () => fitPrice(records));
if (!fit.enough) throw new Error(fit.reason);
time('fairPriceBand × 1,000', () => {
  for (let i = 0; i < 1_000; i++) fairPriceBand(fit, { ruleLengthIn: 100 + i / 4, features: i % 60 });
});
time('pricePerInch', () => pricePerInch(records));
time('priceTrend', () => priceTrend(records));

console.log(`model ${fit.model}, n ${fit.n}, residual standard error ${fit.residualStandardErrorCents} cents`);
// maxRSS is the peak resident set size of the whole process (kibibytes on Linux), generation included.
console.log(`peak resident memory ${mib(process.resourceUsage().maxRSS * 1024)}`);
// For the summary table of `npm run bench` (see scripts/lib/benchResults.ts).
console.log(
  `@result ${JSON.stringify({ figure: `price fit in memory, ${n.toLocaleString('en-US')} records`, value: `${took['fitPrice (both models)']!.toFixed(0)} ms` })}`,
);
