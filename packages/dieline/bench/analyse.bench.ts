// Benchmark: a 20,000-entity DXF made in memory, analysed, beside dxf-parser's own parse time
// for the same text. Run: npx tsx packages/dieline/bench/analyse.bench.ts
import DxfParser from 'dxf-parser';
import * as d from '../fixtures/dxf';
import { analyseDieline } from '../src/index';

const ENTITIES = Number(process.env.BENCH_ENTITIES) || 20_000;
const RUNS = 5;

/**
 * A grid of cells, 10 entities each: a cut box of four LINEs, a crease across it, a perf ARC,
 * a kiss-cut LWPOLYLINE with a bulge, a cut LWPOLYLINE slot with two bulges, and two CIRCLE
 * punches. Cells sit 3 in apart so their rules do not touch.
 */
function makeDxf(entities: number): string {
  const out: d.Pairs[] = [];
  const cols = Math.ceil(Math.sqrt(entities / 10));
  for (let i = 0; out.length < entities; i++) {
    const x = (i % cols) * 3;
    const y = Math.floor(i / cols) * 3;
    const cell: d.Pairs[] = [
      d.line('CUT', x, y, x + 2, y),
      d.line('CUT', x + 2, y, x + 2, y + 2),
      d.line('CUT', x + 2, y + 2, x, y + 2),
      d.line('CUT', x, y + 2, x, y),
      d.line('CREASE', x + 1, y, x + 1, y + 2),
      d.arc('PERF', x + 0.5, y + 1.5, 0.3, 0, 180),
      d.lwpolyline('KISS CUT', [
        [x + 1.2, y + 1.2, 0.5],
        [x + 1.8, y + 1.2],
        [x + 1.8, y + 1.8],
      ]),
      d.lwpolyline(
        'CUT',
        [
          [x + 0.2, y + 0.2],
          [x + 0.6, y + 0.2, 1],
          [x + 0.6, y + 0.4],
          [x + 0.2, y + 0.4, 1],
        ],
        true,
      ),
      d.circle('CUT', x + 1.5, y + 0.5, 0.125),
      d.circle('CUT', x + 1.5, y + 0.8, 0.1),
    ];
    out.push(...cell.slice(0, entities - out.length));
  }
  return d.dxf(out, { insunits: 1 });
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const time = (fn: () => void) => {
  const t = process.hrtime.bigint();
  fn();
  return Number(process.hrtime.bigint() - t) / 1e6;
};

const text = makeDxf(ENTITIES);
const parseMs: number[] = [];
const analyseMs: number[] = [];
let metrics = analyseDieline(text).metrics; // warm-up
for (let r = 0; r < RUNS; r++) {
  parseMs.push(time(() => new DxfParser().parseSync(text)));
  analyseMs.push(time(() => (metrics = analyseDieline(text).metrics)));
}
const mem = process.memoryUsage();
const maxRssMb = process.resourceUsage().maxRSS / 1024; // maxRSS is in kilobytes

const p = median(parseMs);
const a = median(analyseMs);
console.log(
  `dieline analysis benchmark: ${ENTITIES} entities, ${(text.length / 1048576).toFixed(1)} MB of DXF, median of ${RUNS} runs`,
);
console.log(`  dxf-parser parse      ${p.toFixed(0)} ms`);
console.log(`  analyseDieline        ${a.toFixed(0)} ms (parse included)`);
console.log(`  ratio analyse/parse   ${(a / p).toFixed(2)}`);
console.log(`  heap used ${(mem.heapUsed / 1048576).toFixed(0)} MB, peak RSS ${maxRssMb.toFixed(0)} MB`);
console.log(
  `  check: ${metrics.punches} punches, ${metrics.joints} joints, ${metrics.bends} bends, ${metrics.length.total.toFixed(1)} in of rule`,
);

// Linear in entity count up to the 200,000-entity limit: time per 1,000 entities at three sizes
// (median of 3 runs each; the 20,000 figure is the one above).
const perThousand = new Map<number, number>([[ENTITIES, a / (ENTITIES / 1000)]]);
for (const n of [100_000, 200_000]) {
  const big = makeDxf(n);
  analyseDieline(big); // warm-up at this size
  const runs = [0, 1, 2].map(() => time(() => analyseDieline(big)));
  perThousand.set(n, median(runs) / (n / 1000));
}
console.log('  time per 1,000 entities');
for (const [n, ms] of perThousand) console.log(`    ${n.toLocaleString('en-US').padStart(7)}  ${ms.toFixed(1)} ms`);
const growth = perThousand.get(200_000)! / perThousand.get(ENTITIES)!;
console.log(`  200,000 against ${ENTITIES.toLocaleString('en-US')}, per 1,000 entities: ${growth.toFixed(2)}`);

// For the summary table of `npm run bench` (see scripts/lib/benchResults.ts).
console.log(
  `@result ${JSON.stringify({ figure: `dieline analysis, ${ENTITIES.toLocaleString('en-US')} entities`, value: `${a.toFixed(0)} ms`, baseline: `parse ${p.toFixed(0)} ms`, ratio: a / p, target: 'ratio ≤ 2', met: a / p <= 2 })}`,
);
console.log(
  `@result ${JSON.stringify({ figure: 'dieline analysis per 1,000 entities, 200,000 against 20,000', value: [...perThousand.values()].map((ms) => `${ms.toFixed(1)} ms`).join(' / '), ratio: growth, target: 'ratio ≤ 1.2 (linear)', met: growth <= 1.2 })}`,
);
