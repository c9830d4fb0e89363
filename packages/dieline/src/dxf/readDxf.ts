import DxfParser, { type IDxf, type IEntity, type IInsertEntity } from 'dxf-parser';
import { type Drawing, DrawingBuilder, type DrawingUnits } from '../drawing';
import { DielineError } from '../errors';
import { type Matrix, multiply, rotate, scale, translate } from '../geometry/matrix';
import { type Limits, MAX_BLOCK_DEPTH } from '../limits';
import type { RuleTypeChoice, RuleTypeResolver } from '../ruleType';
import { inchesPerInsunit } from '../units';
import { type UnitName, UNIT_INCHES } from '../unitNames';
import { entityGeometry } from './entities';

export interface ReadDxfOptions {
  resolve: RuleTypeResolver;
  limits: Limits;
  /** Overrides the file's $INSUNITS. */
  units?: UnitName;
}

const INSUNITS_NAMES: Readonly<Record<number, string>> = { 1: 'in', 2: 'ft', 4: 'mm', 5: 'cm', 6: 'm' };

/** Reads an ASCII DXF into rule paths in inches. */
export function readDxf(text: string, opts: ReadDxfOptions): Drawing {
  const dxf = parse(text);
  const b = new DrawingBuilder(opts.limits);
  const units = drawingUnits(dxf, opts.units, b);
  const root = scale(units.inchesPerUnit);
  const active: string[] = [];
  // One rule type choice per layer name, resolved once and shared by its entities.
  const choices = new Map<string, RuleTypeChoice>();
  const choiceOf = (layer: string): RuleTypeChoice => {
    let choice = choices.get(layer);
    if (!choice) choices.set(layer, (choice = opts.resolve([layer])));
    return choice;
  };

  const walk = (entities: IEntity[], m: Matrix, parentLayer: string | null, depth: number): void => {
    for (const entity of entities) {
      if (entity.inPaperSpace) {
        b.warn('Entities in paper space (layouts) were skipped; only model space is measured.');
        continue;
      }
      // DXF convention (from memory): entities of a block on layer "0" take the layer of the INSERT.
      const rawLayer = typeof entity.layer === 'string' && entity.layer !== '' ? entity.layer : '0';
      const layer = parentLayer !== null && rawLayer === '0' ? parentLayer : rawLayer;
      if (entity.type === 'INSERT') {
        insert(entity as IInsertEntity, m, layer, depth);
        continue;
      }
      const choice = choiceOf(layer);
      const geometry = entityGeometry(entity, m);
      if (geometry === null) {
        b.skip(entity.type);
        continue;
      }
      b.countEntity(choice);
      if ('problem' in geometry) {
        b.warn(`Skipped ${geometry.problem} on layer "${layer}".`);
        continue;
      }
      if (entity.type === 'SPLINE' && (entity as { rational?: boolean }).rational) {
        b.warn('A rational SPLINE was measured with equal weights (its weights are not read); check its length.');
      }
      b.addPath(choice, geometry.segments, geometry.closed);
    }
  };

  const insert = (e: IInsertEntity, m: Matrix, layer: string, depth: number): void => {
    const block = dxf.blocks?.[e.name];
    if (!block) {
      b.warn(`An INSERT names a block "${e.name}" that the file does not define; skipped.`);
      return;
    }
    if (active.includes(e.name) || depth >= MAX_BLOCK_DEPTH) {
      b.warn(`Block "${e.name}" inserts itself or nests deeper than ${MAX_BLOCK_DEPTH} levels; skipped there.`);
      return;
    }
    const num = (v: unknown, fallback: number) => (typeof v === 'number' && Number.isFinite(v) ? v : fallback);
    const base = block.position ?? { x: 0, y: 0 };
    const pos = e.position ?? { x: 0, y: 0 };
    const mirrored = num(e.extrusionDirection?.z, 1) < 0;
    // DXF reference (INSERT): block base point to origin, scale, (array offset), rotate, move to
    // the insertion point; in the OCS of the extrusion direction.
    const place = multiply(
      multiply(mirrored ? multiply(m, scale(-1, 1)) : m, translate(num(pos.x, 0), num(pos.y, 0))),
      rotate((num(e.rotation, 0) * Math.PI) / 180),
    );
    const local = multiply(scale(num(e.xScale, 1), num(e.yScale, 1)), translate(-num(base.x, 0), -num(base.y, 0)));
    const columns = Math.max(1, Math.floor(num(e.columnCount, 1)));
    const rows = Math.max(1, Math.floor(num(e.rowCount, 1)));
    active.push(e.name);
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < columns; c++) {
        const offset = translate(c * num(e.columnSpacing, 0), r * num(e.rowSpacing, 0));
        walk(block.entities ?? [], multiply(multiply(place, offset), local), layer, depth + 1);
      }
    }
    active.pop();
  };

  walk(dxf.entities ?? [], root, null, 0);
  return b.finish(units, true);
}

/**
 * DXF is pairs of lines, a whole-number group code then a value (DXF reference, "Group codes").
 * Checking the codes first gives a clear error with a line number, and keeps the parser from
 * printing its own warnings about them. The text is scanned by character code, without
 * cutting out a string per line.
 */
function checkGroupCodes(text: string): void {
  const len = text.length;
  let start = 0;
  let lineNo = 0;
  let sawEof = false;
  while (start < len) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = len;
    lineNo++;
    let lo = start;
    let hi = end;
    while (lo < hi && isTrimmed(text.charCodeAt(lo))) lo++;
    while (hi > lo && isTrimmed(text.charCodeAt(hi - 1))) hi--;
    if (lo === hi && end >= len - 1) break; // the final newline
    if (!isGroupCode(text, lo, hi)) {
      const code = text.slice(lo, hi);
      throw new DielineError(
        'MALFORMED',
        `The DXF file is damaged: line ${lineNo} should hold a group code (a whole number) but holds "${code.slice(0, 40)}".`,
      );
    }
    const valueEnd = text.indexOf('\n', end + 1);
    if (end >= len) {
      throw new DielineError(
        'TRUNCATED',
        'The DXF file ends in the middle of a group (a code without its value): it looks cut short. Export it again.',
      );
    }
    if (hi - lo === 1 && text.charCodeAt(lo) === 48 /* 0 */) {
      let vlo = end + 1;
      let vhi = valueEnd < 0 ? len : valueEnd;
      while (vlo < vhi && isTrimmed(text.charCodeAt(vlo))) vlo++;
      while (vhi > vlo && isTrimmed(text.charCodeAt(vhi - 1))) vhi--;
      if (vhi - vlo === 3 && text.startsWith('EOF', vlo)) sawEof = true;
    }
    lineNo++;
    start = valueEnd < 0 ? len : valueEnd + 1;
    if (sawEof) break;
  }
  if (!sawEof)
    throw new DielineError(
      'TRUNCATED',
      'The DXF file ends before its EOF marker: it looks cut short. Export it again.',
    );
}

/** What String.prototype.trim removes: white space and line terminators (ECMAScript). */
function isTrimmed(c: number): boolean {
  if (c <= 32) return c === 32 || (c >= 9 && c <= 13);
  if (c < 160) return false;
  return (
    c === 160 ||
    c === 0x1680 ||
    (c >= 0x2000 && c <= 0x200a) ||
    c === 0x2028 ||
    c === 0x2029 ||
    c === 0x202f ||
    c === 0x205f ||
    c === 0x3000 ||
    c === 0xfeff
  );
}

/** text[lo, hi) is an optional minus and one to four digits. */
function isGroupCode(text: string, lo: number, hi: number): boolean {
  if (lo < hi && text.charCodeAt(lo) === 45 /* - */) lo++;
  if (hi - lo < 1 || hi - lo > 4) return false;
  for (let i = lo; i < hi; i++) {
    const c = text.charCodeAt(i);
    if (c < 48 || c > 57) return false;
  }
  return true;
}

function parse(text: string): IDxf {
  checkGroupCodes(text);
  let dxf: IDxf | null;
  try {
    dxf = new DxfParser().parseSync(text);
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    if (/end of input|EOF group/i.test(message)) {
      throw new DielineError(
        'TRUNCATED',
        'The DXF file ends before its EOF marker: it looks cut short. Export it again.',
      );
    }
    throw new DielineError('MALFORMED', `The DXF file could not be read: ${message}.`);
  }
  if (!dxf || !Array.isArray(dxf.entities)) {
    throw new DielineError('MALFORMED', 'The DXF file has no ENTITIES section, so there is nothing to measure.');
  }
  return dxf;
}

function drawingUnits(dxf: IDxf, override: UnitName | undefined, b: DrawingBuilder): DrawingUnits {
  if (override) return { name: override, inchesPerUnit: UNIT_INCHES[override], source: 'option' };
  const code = dxf.header?.['$INSUNITS'];
  const perUnit = typeof code === 'number' ? inchesPerInsunit[code] : undefined;
  if (typeof code === 'number' && perUnit !== undefined) {
    return { name: INSUNITS_NAMES[code] ?? `$INSUNITS ${code}`, inchesPerUnit: perUnit, source: 'file' };
  }
  b.warn(
    typeof code === 'number' && code !== 0
      ? `The file's units ($INSUNITS ${code}) are not inches, feet, millimetres, centimetres or metres; read as inches. Please confirm the units.`
      : 'The file does not say its units ($INSUNITS is missing or 0); read as inches. Please confirm the units.',
  );
  return { name: 'in', inchesPerUnit: 1, source: 'assumed' };
}
