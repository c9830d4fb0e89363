import { deflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { svgPathProperties } from 'svg-path-properties';
import { layer, pdfFile, PT, separation } from '../../fixtures/pdfFile';
import { analyseDielineAsync } from '../analyse';
import { DielineError } from '../errors';

// Every answer below is worked out by hand from the drawing instructions: 72 pt = 1 in
// (ISO 32000-1, 8.3.2.3), lengths of rectangles and lines by plain geometry.

const cutAndCrease = {
  resources: '<< /ColorSpace << /C0 {{cut}} /C1 {{crease}} >> >>',
  objects: { cut: separation('Cut'), crease: separation('Crease', '1 0 0 0') },
};

/** A 4 × 3 in rectangle on the Cut separation (14 in) and a 4 in line across it on Crease. */
const boxPage = `/C0 CS 1 SCN 0 0 ${4 * PT} ${3 * PT} re S
/C1 CS 1 SCN 0 ${1.5 * PT} m ${4 * PT} ${1.5 * PT} l S`;

async function measure(bytes: Uint8Array, opts: Parameters<typeof analyseDielineAsync>[1] = {}) {
  return (await analyseDielineAsync(bytes, opts)).metrics;
}

async function refusal(bytes: Uint8Array, opts: Parameters<typeof analyseDielineAsync>[1] = {}) {
  try {
    await analyseDielineAsync(bytes, opts);
  } catch (error) {
    if (error instanceof DielineError) return error;
    throw error;
  }
  throw new Error('the PDF was measured');
}

describe('PDF dielines: rule types', () => {
  it('takes the rule type from the stroke colour’s separation name', async () => {
    const m = await measure(pdfFile([{ content: boxPage, resources: cutAndCrease.resources }], cutAndCrease));
    expect(m.length.cut).toBeCloseTo(14, 9);
    expect(m.length.crease).toBeCloseTo(4, 9);
    expect(m.bbox).toEqual({ width: 4, height: 3 });
    expect(m.layers.map((l) => [l.name, l.ruleType])).toEqual([
      ['Crease', 'crease'],
      ['Cut', 'cut'],
    ]);
    expect(m.page).toEqual({ number: 1, count: 1 });
  });

  it('reads a DeviceN colorant and a name written with #xx escapes', async () => {
    const content = `/P CS 1 SCN 0 0 m ${5 * PT} 0 l S /K CS 1 SCN 0 ${PT} m ${2 * PT} ${PT} l S`;
    const m = await measure(
      pdfFile([{ content, resources: '<< /ColorSpace << /P {{perf}} /K {{kiss}} >> >>' }], {
        objects: {
          perf: '[/DeviceN [/Perf#20rule] /DeviceCMYK << /FunctionType 2 /Domain [0 1] /C0 [0 0 0 0] /C1 [0 0 1 0] /N 1 >>]',
          kiss: separation('Kiss#2DCut'),
        },
      }),
    );
    expect(m.length.perf).toBeCloseTo(5, 9);
    expect(m.length.kiss).toBeCloseTo(2, 9);
    expect(m.layers.map((l) => l.name).sort()).toEqual(['Kiss-Cut', 'Perf rule']);
  });

  it('falls back to the optional-content group (layer) the path is drawn in', async () => {
    // A grey stroke (no separation) inside /OC /L1 BDC … EMC: the layer "Creasing" names it.
    const content = `/OC /L1 BDC 0 G 0 0 m ${3 * PT} 0 l S EMC 0 ${PT} m ${PT} ${PT} l S`;
    const m = await measure(
      pdfFile([{ content, resources: '<< /Properties << /L1 {{oc}} >> >>' }], { objects: { oc: layer('Creasing') } }),
    );
    expect(m.length.crease).toBeCloseTo(3, 9);
    expect(m.length.other).toBeCloseTo(1, 9); // outside any layer, on no separation
  });

  it('prefers the separation over the layer, and the user’s map over both keywords', async () => {
    const content = `/OC /L1 BDC /C0 CS 1 SCN 0 0 m ${2 * PT} 0 l S EMC`;
    const file = pdfFile([{ content, resources: '<< /ColorSpace << /C0 {{sep}} >> /Properties << /L1 {{oc}} >> >>' }], {
      objects: { sep: separation('Cut'), oc: layer('Crease lines') },
    });
    expect((await measure(file)).length.cut).toBeCloseTo(2, 9);
    expect((await measure(file, { layerMap: { cut: 'perf' } })).length.perf).toBeCloseTo(2, 9);
  });

  it('measures unnamed strokes as other and lists the separations and layers found', async () => {
    const content = `/OC /L1 BDC /C0 CS 1 SCN 0 0 m ${2 * PT} 0 l S EMC`;
    const file = pdfFile([{ content, resources: '<< /ColorSpace << /C0 {{sep}} >> /Properties << /L1 {{oc}} >> >>' }], {
      objects: { sep: separation('PANTONE 485 C'), oc: layer('Dieline') },
    });
    const m = await measure(file);
    expect(m.length.other).toBeCloseTo(2, 9);
    expect(m.warnings.join(' ')).toContain('found separations "PANTONE 485 C"; layers "Dieline"');
    // The buyer maps the separation, as in the UI.
    expect((await measure(file, { layerMap: { 'PANTONE 485 C': 'cut' } })).length.cut).toBeCloseTo(2, 9);
  });

  it('ignores filled shapes (artwork) for length and counts them in a warning', async () => {
    const content = `${boxPage}\n0 0 1 rg 10 10 50 50 re f 20 20 m 40 20 l 30 40 l h f*`;
    const m = await measure(pdfFile([{ content, resources: cutAndCrease.resources }], cutAndCrease));
    expect(m.length.total).toBeCloseTo(18, 9);
    expect(m.warnings).toContain('2 filled shapes (artwork or text) were not measured: only stroked lines are rules.');
  });
});

describe('PDF dielines: geometry', () => {
  it('applies the transformation matrix through q, cm and Q', async () => {
    // A 1 × 0.5 in rectangle scaled by 2 (perimeter 6 in), then, after Q, a 1 in line unscaled.
    const content = `/C0 CS 1 SCN q 2 0 0 2 0 0 cm 0 0 ${PT} ${PT / 2} re S Q 0 ${2 * PT} m ${PT} ${2 * PT} l S`;
    const m = await measure(pdfFile([{ content, resources: cutAndCrease.resources }], cutAndCrease));
    expect(m.length.cut).toBeCloseTo(7, 9);
    expect(m.bbox).toEqual({ width: 2, height: 2 });
  });

  it('follows nested form XObjects with their matrices, resources and layers', async () => {
    // The page draws form A twice (second time moved 5 in right); A draws a 1 in line on Cut
    // and form B scaled by 3 (its 1 in line becomes 3 in), B sits on the layer "Crease".
    const m = await measure(
      pdfFile([{ content: `/A Do q 1 0 0 1 ${5 * PT} 0 cm /A Do Q`, resources: '<< /XObject << /A {{a}} >> >>' }], {
        objects: {
          a: {
            dict: '<< /Type /XObject /Subtype /Form /BBox [0 0 1000 1000] /Resources << /ColorSpace << /C0 {{cut}} >> /XObject << /B {{b}} >> >> >>',
            stream: `/C0 CS 1 SCN 0 0 m ${PT} 0 l S /B Do`,
            deflate: true,
          },
          b: {
            dict: '<< /Type /XObject /Subtype /Form /BBox [0 0 100 100] /Matrix [3 0 0 3 0 72] /OC {{oc}} >>',
            // A form inherits the stroke colour (Cut here); grey leaves the layer to decide.
            stream: `0 G 0 0 m ${PT} 0 l S`,
          },
          oc: layer('Crease'),
          cut: separation('Cut'),
        },
      }),
    );
    expect(m.length.cut).toBeCloseTo(2, 9);
    expect(m.length.crease).toBeCloseTo(6, 9);
    expect(m.bbox.width).toBeCloseTo(8, 9); // 5 in + the 3 in crease
  });

  it('scales by the page’s UserUnit', async () => {
    // UserUnit 10: one unit is 10/72 in, so a 72-unit line is 10 in.
    const m = await measure(
      pdfFile(
        [{ content: `/C0 CS 1 SCN 0 0 m ${PT} 0 l S`, resources: cutAndCrease.resources, userUnit: 10 }],
        cutAndCrease,
      ),
    );
    expect(m.length.cut).toBeCloseTo(10, 9);
  });

  it('measures a Bézier curve as the reference library does', async () => {
    // A quarter circle of radius 1 in drawn as one cubic (k = 0.5523); its length by
    // svg-path-properties, a general-purpose SVG path library, on the same control points.
    const k = 0.5523 * PT;
    const curve = `${PT} 0 m ${PT} ${k} ${k} ${PT} 0 ${PT} c S`;
    const m = await measure(
      pdfFile([{ content: `/C0 CS 1 SCN ${curve}`, resources: cutAndCrease.resources }], cutAndCrease),
    );
    const reference = new svgPathProperties(`M 1 0 C 1 ${k / PT} ${k / PT} 1 0 1`).getTotalLength();
    expect(Math.abs(m.length.cut - reference) / reference).toBeLessThan(1e-4);
    expect(m.length.cut).toBeCloseTo((Math.PI / 2) * 1.00027, 3); // r·π/2·(1 + 2.7e-4), from memory
    expect(m.curves).toBe(1);
  });

  it('closes subpaths with h and s, and reads v and y curves', async () => {
    // A 2 × 1 in triangle closed by s: 2 + 1 + √5 in. A v curve whose controls lie on the chord
    // is a straight 1 in line.
    const content = `/C0 CS 1 SCN 0 0 m ${2 * PT} 0 l ${2 * PT} ${PT} l s 0 ${3 * PT} m ${PT / 2} ${3 * PT} ${PT} ${3 * PT} v S`;
    const m = await measure(pdfFile([{ content, resources: cutAndCrease.resources }], cutAndCrease));
    expect(m.length.cut).toBeCloseTo(3 + Math.sqrt(5) + 1, 9);
    expect(m.closedContours).toBe(1);
  });
});

describe('PDF dielines: pages', () => {
  const textPage = { content: 'BT /F1 12 Tf 72 700 Td (Job 4471, 12 up) Tj ET' };
  const rulesPage = { content: `/C0 CS 1 SCN 0 0 m ${3 * PT} 0 l S`, resources: cutAndCrease.resources };
  const twoRulesPage = { content: `/C0 CS 1 SCN 0 0 m ${5 * PT} 0 l S`, resources: cutAndCrease.resources };
  const file = pdfFile([textPage, rulesPage, twoRulesPage], cutAndCrease);

  it('measures the first page with stroked lines and says so', async () => {
    const m = await measure(file);
    expect(m.length.cut).toBeCloseTo(3, 9);
    expect(m.page).toEqual({ number: 2, count: 3 });
    expect(m.warnings[0]).toMatch(/has 3 pages; page 2 was measured \(the first with stroked lines\)/);
  });

  it('measures the page the user picks', async () => {
    const m = await measure(file, { page: 3 });
    expect(m.length.cut).toBeCloseTo(5, 9);
    expect(m.page).toEqual({ number: 3, count: 3 });
  });

  it('refuses a page that is not there, or one with nothing to measure', async () => {
    expect((await refusal(file, { page: 4 })).message).toBe('The PDF has 3 pages; there is no page 4 to measure.');
    const e = await refusal(file, { page: 1 });
    expect(e.code).toBe('NO_VECTORS');
    expect(e.message).toMatch(/^Page 1 of the PDF has no vector lines/);
  });
});

describe('PDF dielines: files that cannot be measured', () => {
  it('refuses a scan (an image and nothing else) and asks for a vector export', async () => {
    const e = await refusal(
      pdfFile([{ content: 'q 612 0 0 792 0 0 cm /Im0 Do Q', resources: '<< /XObject << /Im0 {{img}} >> >>' }], {
        objects: {
          img: {
            dict: '<< /Type /XObject /Subtype /Image /Width 2 /Height 2 /ColorSpace /DeviceGray /BitsPerComponent 8 >>',
            stream: '\x00\xff\xff\x00',
          },
        },
      }),
    );
    expect(e.code).toBe('NO_VECTORS');
    expect(e.message).toMatch(/holds only an image \(a scan or a flattened export\).*vector PDF, DXF or SVG/);
  });

  it('refuses a page of filled shapes only, saying why', async () => {
    const e = await refusal(pdfFile([{ content: '0 0 100 100 re f' }]));
    expect(e.code).toBe('NO_GEOMETRY');
    expect(e.message).toMatch(/only filled shapes \(1 shape\), no stroked lines/);
  });

  it('refuses an encrypted PDF', async () => {
    const e = await refusal(
      pdfFile([rulesPageOf(1)], {
        ...cutAndCrease,
        trailer: '/Encrypt << /Filter /Standard /V 2 /R 3 /O (x) /U (y) /P -4 >>',
      }),
    );
    expect(e.code).toBe('ENCRYPTED');
  });

  it('refuses a broken or cut-short file with a plain message', async () => {
    const whole = pdfFile([rulesPageOf(1)], cutAndCrease);
    for (const bytes of [whole.slice(0, 40), new TextEncoder().encode('%PDF-1.7\n1 0 obj << /Type /Catalog >>\n')]) {
      const e = await refusal(bytes);
      expect(['MALFORMED', 'NO_GEOMETRY']).toContain(e.code);
      expect(e.message).toMatch(/PDF/);
    }
  });

  it('stops at the operator limit before the work grows', async () => {
    const many = Array.from({ length: 2000 }, (_, i) => `0 ${i} m 10 ${i} l S`).join('\n');
    const e = await refusal(pdfFile([{ content: many }]), { limits: { maxPdfOperators: 1000 } });
    expect(e.code).toBe('TOO_MANY_ENTITIES');
  });

  it('stops unpacking a compressed stream past the byte limit (a deflate bomb)', async () => {
    const bomb = Buffer.alloc(8 * 1024 * 1024, 0x20); // 8 MB of spaces deflate to about 8 KB
    const withBomb = pdfFile([{ content: '/F Do', resources: '<< /XObject << /F {{f}} >> >>' }], {
      objects: { f: { dict: '<< /Type /XObject /Subtype /Form /BBox [0 0 1 1] >>', stream: bomb, deflate: true } },
    });
    expect(deflateSync(bomb).length).toBeLessThan(64 * 1024);
    const e = await refusal(withBomb, { limits: { maxPdfContentBytes: 1024 * 1024 } });
    expect(e.code).toBe('TOO_LARGE');
  });

  it('refuses a form that draws itself', async () => {
    const e = await refusal(
      pdfFile([{ content: '/F Do', resources: '<< /XObject << /F {{f}} >> >>' }], {
        objects: {
          f: {
            dict: '<< /Type /XObject /Subtype /Form /BBox [0 0 1 1] /Resources << /XObject << /F {{f}} >> >> >>',
            stream: '0 0 m 10 0 l S /F Do',
          },
        },
      }),
    );
    expect(e.code).toBe('MALFORMED');
    expect(e.message).toMatch(/draws a form inside itself/);
  });

  it('never runs or passes on JavaScript or actions in the file', async () => {
    const analysis = await analyseDielineAsync(
      pdfFile([rulesPageOf(2)], {
        ...cutAndCrease,
        objects: {
          ...cutAndCrease.objects,
          js: '<< /S /JavaScript /JS (app.alert\\("hello"\\); this.exportDataObject\\(\\)) >>',
        },
        catalog: '/OpenAction {{js}} /Names << /JavaScript << /Names [(a) {{js}}] >> >>',
      }),
    );
    expect(analysis.metrics.length.cut).toBeCloseTo(2, 9);
    const out = JSON.stringify(analysis);
    expect(out).not.toMatch(/alert|JavaScript|exportDataObject/);
  });
});

function rulesPageOf(inches: number) {
  return { content: `/C0 CS 1 SCN 0 0 m ${inches * PT} 0 l S`, resources: cutAndCrease.resources };
}
