// Command-line wrapper: reads a dieline file and prints its metrics. All I/O lives here.
import { readFileSync, statSync } from 'node:fs';
import { basename } from 'node:path';
import { parseArgs } from 'node:util';
import {
  analyseDielineAsync,
  type AnalyseOptions,
  COMPLEXITY_RULE,
  DEFAULT_LIMITS,
  DielineError,
  inchesToMm,
  type DielineAnalysis,
  type LayerMap,
  RULE_TYPES,
  type RuleType,
  UNIT_NAMES,
  type UnitName,
} from '../src/index';

const USAGE =
  'usage: dieline FILE [--json] [--units in|mm] [--margin IN] [--map LAYER=TYPE]... [--drawing-units in|mm|cm|m|ft|px] [--press WxL] [--page N]';

/** The units the table is printed in; the JSON is in inches whatever this says. */
type ShownUnits = 'in' | 'mm';

class UsageError extends Error {}

function options(argv: string[]): { file: string; json: boolean; shown: ShownUnits; opts: AnalyseOptions } {
  const { values, positionals } = parseArgs({
    args: argv,
    allowPositionals: true,
    options: {
      json: { type: 'boolean', default: false },
      margin: { type: 'string' },
      map: { type: 'string', multiple: true },
      units: { type: 'string' },
      'drawing-units': { type: 'string' },
      press: { type: 'string' },
      page: { type: 'string' },
      help: { type: 'boolean', short: 'h', default: false },
    },
  });
  if (values.help) {
    process.stdout.write(`${USAGE}\n`);
    process.exit(0);
  }
  if (positionals.length !== 1) throw new UsageError(positionals.length === 0 ? 'no file given' : 'give one file');
  const opts: AnalyseOptions = { fileName: basename(positionals[0]!) };
  if (values.margin !== undefined) {
    const m = Number(values.margin);
    if (!Number.isFinite(m) || m < 0) throw new UsageError(`--margin "${values.margin}" is not a number of inches`);
    opts.marginIn = m;
  }
  if (values.map) {
    const map: Record<string, RuleType> = {};
    for (const entry of values.map) {
      const at = entry.lastIndexOf('=');
      const type = entry.slice(at + 1).toLowerCase();
      if (at <= 0 || !(RULE_TYPES as readonly string[]).includes(type)) {
        throw new UsageError(`--map "${entry}" is not LAYER=TYPE with TYPE one of ${RULE_TYPES.join(', ')}`);
      }
      map[entry.slice(0, at)] = type as RuleType;
    }
    opts.layerMap = map as LayerMap;
  }
  const shown = values.units ?? 'in';
  if (shown !== 'in' && shown !== 'mm')
    throw new UsageError(
      `--units is how the table shows lengths, in or mm; the file's own units are --drawing-units ${UNIT_NAMES.join('|')}`,
    );
  const drawing = values['drawing-units'];
  if (drawing !== undefined) {
    if (!(UNIT_NAMES as readonly string[]).includes(drawing))
      throw new UsageError(`--drawing-units must be one of ${UNIT_NAMES.join(', ')}`);
    opts.units = drawing as UnitName;
  }
  if (values.press !== undefined) {
    const m = /^\s*(\d+(?:\.\d+)?)\s*[xX×]\s*(\d+(?:\.\d+)?)\s*$/.exec(values.press);
    if (!m) throw new UsageError(`--press "${values.press}" is not WIDTHxLENGTH in inches, e.g. 22x30`);
    opts.press = { widthIn: Number(m[1]), lengthIn: Number(m[2]) };
  }
  if (values.page !== undefined) {
    if (!/^\d+$/.test(values.page) || Number(values.page) < 1)
      throw new UsageError(`--page "${values.page}" is not a page number (1, 2, …)`);
    opts.page = Number(values.page);
  }
  return { file: positionals[0]!, json: values.json ?? false, shown, opts };
}

function table(a: DielineAnalysis, file: string, shown: ShownUnits): string {
  const m = a.metrics;
  const f = (v: number, digits = 3) => v.toFixed(digits);
  // The chosen unit first, the other beside it.
  const both = (inches: number, inDigits: number, mmDigits: number) =>
    shown === 'mm'
      ? `${f(inchesToMm(inches), mmDigits)} mm   ${f(inches, inDigits)} in`
      : `${f(inches, inDigits)} in   ${f(inchesToMm(inches), mmDigits)} mm`;
  const size = (box: { width: number; height: number }) =>
    shown === 'mm'
      ? `${f(inchesToMm(box.width), 1)} × ${f(inchesToMm(box.height), 1)} mm`
      : `${f(box.width)} × ${f(box.height)} in`;
  const rows: Array<[string, string]> = [
    ['file', file],
    [
      'format',
      `${a.format.toUpperCase()}, drawing units ${a.drawingUnits.name}${a.drawingUnits.source === 'assumed' ? ' (assumed)' : ''}`,
    ],
    ...(['cut', 'crease', 'perf', 'kiss', 'other', 'total'] as const).map((k): [string, string] => [
      `length ${k}`,
      both(m.length[k], 3, 1),
    ]),
    ['curves', String(m.curves)],
    ['smallest radius', m.minRadius === null ? '-' : both(m.minRadius, 4, 2)],
    ['bends', String(m.bends)],
    ['joints', String(m.joints)],
    ['closed contours', String(m.closedContours)],
    ['punches', String(m.punches)],
    ['rules box', size(m.bbox)],
    ['board', size(m.board)],
    ['fits press', m.fitsPress === null ? '- (no press given)' : m.fitsPress ? 'yes' : 'no'],
    ['complexity', m.complexity],
    ...(m.page ? [['page', `${m.page.number} of ${m.page.count}`] as [string, string]] : []),
  ];
  const w = Math.max(...rows.map(([k]) => k.length));
  const lines = rows.map(([k, v]) => `${k.padEnd(w)}  ${v}`);
  lines.push('', 'layers:');
  for (const l of m.layers)
    lines.push(`  ${l.name}  →  ${l.ruleType}  (${l.entities} entit${l.entities === 1 ? 'y' : 'ies'})`);
  if (m.warnings.length > 0) lines.push('', 'warnings:', ...m.warnings.map((x) => `  - ${x}`));
  lines.push('', `complexity rule: ${COMPLEXITY_RULE}`);
  return `${lines.join('\n')}\n`;
}

/** The metrics in inches as the contract has them, with the rules box and the board in millimetres beside them. */
function withMillimetres(m: DielineAnalysis['metrics']) {
  const mm = (box: { width: number; height: number }) => ({
    width: inchesToMm(box.width),
    height: inchesToMm(box.height),
  });
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(m)) {
    out[key] = value;
    if (key === 'bbox') out.bboxMm = mm(m.bbox);
    if (key === 'board') out.boardMm = mm(m.board);
  }
  return out;
}

async function main(): Promise<number> {
  let file = '';
  try {
    const parsed = options(process.argv.slice(2));
    file = parsed.file;
    const size = statSync(file).size;
    if (size > DEFAULT_LIMITS.maxBytes) {
      throw new DielineError(
        'TOO_LARGE',
        `The file is ${(size / 1048576).toFixed(1)} MB; the most accepted is ${DEFAULT_LIMITS.maxBytes / 1048576} MB.`,
      );
    }
    const result = await analyseDielineAsync(new Uint8Array(readFileSync(file)), parsed.opts);
    process.stdout.write(
      parsed.json ? `${JSON.stringify(withMillimetres(result.metrics))}\n` : table(result, file, parsed.shown),
    );
    return 0;
  } catch (err) {
    const oneLine = (s: string) => s.replace(/\s+/g, ' ').trim();
    if (err instanceof UsageError) {
      process.stderr.write(`dieline: ${oneLine(err.message)}\n${USAGE}\n`);
      return 2;
    }
    if (err instanceof DielineError) {
      process.stderr.write(`dieline: ${file}: ${oneLine(err.message)} [${err.code}]\n`);
      return 1;
    }
    const e = err as NodeJS.ErrnoException;
    if (e && typeof e.code === 'string' && typeof e.message === 'string') {
      const why =
        e.code === 'ENOENT'
          ? 'no such file'
          : e.code === 'EISDIR'
            ? 'is a folder, not a file'
            : e.code === 'EACCES'
              ? 'permission denied'
              : oneLine(e.message);
      process.stderr.write(`dieline: ${file || 'input'}: ${why}\n`);
      return 1;
    }
    process.stderr.write(`dieline: ${file}: ${oneLine(err instanceof Error ? err.message : String(err))}\n`);
    return 1;
  }
}

process.exitCode = await main();
