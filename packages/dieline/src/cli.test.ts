import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { layer, pdfFile, PT, separation } from '../fixtures/pdfFile';

// The command as `npm run -s dieline` runs it: tsx on bin/dieline.ts.
const root = fileURLToPath(new URL('../../..', import.meta.url));
const fixture = (name: string) => fileURLToPath(new URL(`../fixtures/${name}`, import.meta.url));
const run = (...args: string[]) =>
  spawnSync(
    process.execPath,
    [join(root, 'node_modules/tsx/dist/cli.mjs'), join(root, 'packages/dieline/bin/dieline.ts'), ...args],
    {
      cwd: root,
      encoding: 'utf8',
    },
  );

describe('dieline command', () => {
  it('prints one JSON object with the metrics fields', () => {
    const r = run(fixture('box-mm.dxf'), '--json', '--press', '22x30', '--margin', '0.5', '--map', 'CREASE=perf');
    expect(r.status).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines).toHaveLength(1);
    const m = JSON.parse(lines[0]!);
    expect(Object.keys(m)).toEqual([
      'units',
      'length',
      'lengthMm',
      'curves',
      'minRadius',
      'bends',
      'joints',
      'closedContours',
      'punches',
      'bbox',
      'bboxMm',
      'board',
      'boardMm',
      'complexity',
      'warnings',
      'fitsPress',
      'layers',
    ]);
    expect(m.lengthMm.perf).toBeCloseTo(50, 9);
    expect(m.board.width).toBeCloseTo(100 / 25.4 + 1, 12); // 0.5 in margin each side
    expect(m.boardMm.width).toBeCloseTo(100 + 25.4, 9); // 1 in = 25.4 mm exactly
    expect(m.bboxMm.width).toBeCloseTo(100, 9);
    expect(m.fitsPress).toBe(true);
  }, 30_000);

  it('prints a readable table', () => {
    const r = run(fixture('label-a4.svg'));
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/length cut\s+13\.003 in\s+330\.3 mm/);
    expect(r.stdout).toMatch(/complexity rule: A die is complex/);
  }, 30_000);

  it('prints the table in millimetres with --units mm, inches beside them', () => {
    const r = run(fixture('label-a4.svg'), '--units', 'mm');
    expect(r.status).toBe(0);
    // 13.003 in × 25.4 = 330.3 mm.
    expect(r.stdout).toMatch(/length cut\s+330\.3 mm\s+13\.003 in/);
    expect(r.stdout).toMatch(/board\s+[\d.]+ × [\d.]+ mm/);
    expect(run(fixture('label-a4.svg'), '--units', 'cm').status).toBe(2);
  }, 30_000);

  it('exits non-zero with one line on stderr for a file it cannot read', () => {
    const dir = mkdtempSync(join(tmpdir(), 'dieline-'));
    const bad = join(dir, 'broken.dxf');
    writeFileSync(bad, '0\nSECTION\n2\nENTITIES\n0\nLINE\n8\nCUT\n10\n0');
    for (const r of [run(bad), run(join(dir, 'missing.dxf')), run(bad, '--json')]) {
      expect(r.status).not.toBe(0);
      expect(r.stdout).toBe('');
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr).toMatch(/^dieline: .*(cut short|no such file)/);
    }
  }, 30_000);

  it('explains a bad option', () => {
    const r = run(fixture('box-mm.dxf'), '--press', 'big');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--press "big" is not WIDTHxLENGTH/);
  }, 30_000);

  it('measures a PDF by separation and by layer, on the page asked for', () => {
    const dir = mkdtempSync(join(tmpdir(), 'dieline-'));
    const file = join(dir, 'carton.pdf');
    // Page 1: a 4 × 3 in rectangle on the "Cut" separation (14 in). Page 2: a 5 in line on the
    // layer "Crease" (grey stroke, no separation).
    writeFileSync(
      file,
      pdfFile(
        [
          { content: `/C0 CS 1 SCN 0 0 ${4 * PT} ${3 * PT} re S`, resources: '<< /ColorSpace << /C0 {{cut}} >> >>' },
          { content: `/OC /L BDC 0 G 0 0 m ${5 * PT} 0 l S EMC`, resources: '<< /Properties << /L {{oc}} >> >>' },
        ],
        { objects: { cut: separation('Cut'), oc: layer('Crease') } },
      ),
    );
    const first = run(file, '--json');
    expect(first.status).toBe(0);
    expect(JSON.parse(first.stdout)).toMatchObject({ length: { cut: 14, crease: 0 }, page: { number: 1, count: 2 } });
    const second = run(file, '--json', '--page', '2');
    expect(JSON.parse(second.stdout)).toMatchObject({ length: { cut: 0, crease: 5 }, page: { number: 2, count: 2 } });
    expect(run(file, '--page', 'two').status).toBe(2);
  }, 30_000);

  it('exits non-zero for a PDF that is only an image', () => {
    const dir = mkdtempSync(join(tmpdir(), 'dieline-'));
    const file = join(dir, 'scan.pdf');
    writeFileSync(
      file,
      pdfFile([{ content: 'q 612 0 0 792 0 0 cm /I Do Q', resources: '<< /XObject << /I {{img}} >> >>' }], {
        objects: {
          img: {
            dict: '<< /Type /XObject /Subtype /Image /Width 1 /Height 1 /ColorSpace /DeviceGray /BitsPerComponent 8 >>',
            stream: '\x00',
          },
        },
      }),
    );
    const r = run(file, '--json');
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/only an image \(a scan or a flattened export\).*\[NO_VECTORS\]/);
  }, 30_000);
});
