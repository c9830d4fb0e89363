// Benchmark: a PDF dieline of 20,000 stroked paths (written in memory, deflated), measured by
// analyseDielineAsync, beside pdf.js's own parse of the same file into its operator list.
// Run: npx tsx packages/dieline/bench/pdf.bench.ts
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { pdfFile, PT, separation } from '../fixtures/pdfFile';
import { analyseDielineAsync } from '../src/index';

const PATHS = Number(process.env.BENCH_PATHS) || 20_000;
const RUNS = 5;

/**
 * A grid of cells, 5 stroked paths each: a cut box (re), a crease across it, a perf arc as a
 * cubic, a kiss-cut rounded corner and a cut slot; cells 3 in apart, each inside a form.
 */
function makePdf(paths: number): Uint8Array {
  const cols = Math.ceil(Math.sqrt(paths / 5));
  const ops: string[] = [];
  for (let i = 0; ops.length < paths; i++) {
    const x = (i % cols) * 3 * PT;
    const y = Math.floor(i / cols) * 3 * PT;
    ops.push(
      `/Cut CS 1 SCN ${x} ${y} ${2 * PT} ${2 * PT} re S`,
      `/Crease CS 1 SCN ${x + PT} ${y} m ${x + PT} ${y + 2 * PT} l S`,
      `/Perf CS 1 SCN ${x + 10} ${y + 100} m ${x + 10} ${y + 130} ${x + 50} ${y + 130} ${x + 50} ${y + 100} c S`,
      `/Kiss CS 1 SCN ${x + 90} ${y + 90} m ${x + 120} ${y + 90} ${x + 130} ${y + 100} ${x + 130} ${y + 130} c S`,
      `/Cut CS 1 SCN ${x + 15} ${y + 15} m ${x + 45} ${y + 15} l ${x + 45} ${y + 30} l ${x + 15} ${y + 30} l h S`,
    );
  }
  const resources = '<< /ColorSpace << /Cut {{cut}} /Crease {{crease}} /Perf {{perf}} /Kiss {{kiss}} >> >>';
  return pdfFile([{ content: ops.slice(0, paths).join('\n'), resources, deflate: true }], {
    objects: {
      cut: separation('Cut'),
      crease: separation('Crease'),
      perf: separation('Perf'),
      kiss: separation('Kiss'),
    },
  });
}

async function pdfjsParse(bytes: Uint8Array): Promise<number> {
  const doc = await getDocument({ data: bytes.slice(), isEvalSupported: false, useSystemFonts: false }).promise;
  const page = await doc.getPage(1);
  const list = await page.getOperatorList();
  await doc.destroy();
  return list.fnArray.length;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
async function time(fn: () => Promise<unknown>): Promise<number> {
  const t = process.hrtime.bigint();
  await fn();
  return Number(process.hrtime.bigint() - t) / 1e6;
}

const bytes = makePdf(PATHS);
let metrics = (await analyseDielineAsync(bytes)).metrics; // warm-up
let operators = await pdfjsParse(bytes);
const parseMs: number[] = [];
const analyseMs: number[] = [];
for (let r = 0; r < RUNS; r++) {
  parseMs.push(await time(async () => (operators = await pdfjsParse(bytes))));
  analyseMs.push(await time(async () => (metrics = (await analyseDielineAsync(bytes)).metrics)));
}
const maxRssMb = process.resourceUsage().maxRSS / 1024;
const p = median(parseMs);
const a = median(analyseMs);
console.log(
  `PDF dieline benchmark: ${PATHS} stroked paths, ${(bytes.length / 1024).toFixed(0)} KB of PDF, median of ${RUNS} runs`,
);
console.log(`  pdf.js operator list   ${p.toFixed(0)} ms (${operators} operators)`);
console.log(`  analyseDielineAsync    ${a.toFixed(0)} ms (reading and measuring)`);
console.log(`  ratio analyse/parse    ${(a / p).toFixed(2)}`);
console.log(`  peak RSS ${maxRssMb.toFixed(0)} MB`);
console.log(`  check: ${metrics.curves} curves, ${metrics.length.total.toFixed(1)} in of rule`);
console.log(
  `@result ${JSON.stringify({ figure: `PDF dieline analysis, ${PATHS.toLocaleString('en-US')} paths`, value: `${a.toFixed(0)} ms`, baseline: `pdf.js ${p.toFixed(0)} ms`, ratio: a / p })}`,
);
