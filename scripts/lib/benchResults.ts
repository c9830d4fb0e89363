/** One figure of `npm run bench`, against its baseline and target where it has them. */
export interface BenchResult {
  figure: string;
  value: string;
  baseline?: string;
  ratio?: number;
  target?: string;
  met?: boolean;
}

/** Marks a line of a benchmark's output as a figure for the summary table. */
export const RESULT_PREFIX = '@result ';

/** Prints figures for `npm run bench` to collect into its one summary table. */
export function recordResults(results: BenchResult[]): void {
  for (const r of results) console.log(`${RESULT_PREFIX}${JSON.stringify(r)}`);
}

/** The summary table of the figures. */
export function summaryTable(rows: BenchResult[]): string {
  const cells = rows.map((r) => [
    r.figure,
    r.value,
    r.baseline ?? '',
    r.ratio === undefined ? '' : r.ratio.toFixed(2),
    r.target ?? '',
    r.met === undefined ? '' : r.met ? 'met' : 'MISSED',
  ]);
  const head = ['figure', 'value', 'baseline', 'ratio', 'target', ''];
  const widths = head.map((h, i) => Math.max(h.length, ...cells.map((c) => c[i]!.length)));
  const line = (c: string[]) =>
    `| ${c.map((v, i) => (i === 0 ? v.padEnd(widths[i]!) : v.padStart(widths[i]!))).join(' | ')} |`;
  return [line(head), `|${widths.map((w) => '-'.repeat(w + 2)).join('|')}|`, ...cells.map(line)].join('\n');
}
