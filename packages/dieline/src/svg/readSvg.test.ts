import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseDieline } from '../analyse';
import { DielineError } from '../errors';

/** An SVG of 96 user units per inch (no viewBox): CSS Values and Units, 1in = 96px. */
const svg = (body: string, root = '') => `<svg xmlns="http://www.w3.org/2000/svg" ${root}>${body}</svg>`;
const metrics = (text: string, opts = {}) => analyseDieline(text, opts).metrics;
const fail = (text: string) => {
  try {
    analyseDieline(text);
  } catch (e) {
    if (e instanceof DielineError) return `${e.code}: ${e.message}`;
    throw e;
  }
  return 'no error';
};

describe('readSvg shapes (96 user units per inch)', () => {
  // line (0,0)–(288,384): 480 px = 5 in (3-4-5 triangle, ×96).
  it('reads line', () => {
    expect(metrics(svg('<line id="cut" x1="0" y1="0" x2="288" y2="384"/>')).length.cut).toBeCloseTo(5, 12);
  });

  // rect 192 × 96 px = 2 × 1 in: perimeter 6 in. With rx = 24 px (0.25 in) the corners become
  // quarter circles: 6 − 8·0.25 + 2π·0.25 = 4 + π/2.
  it('reads rect, with and without rounded corners', () => {
    expect(metrics(svg('<rect class="cut" width="192" height="96"/>')).length.cut).toBeCloseTo(6, 12);
    const m = metrics(svg('<rect class="cut" width="192" height="96" rx="24"/>'));
    expect(m.length.cut).toBeCloseTo(4 + Math.PI / 2, 12);
    expect(m.curves).toBe(4);
    expect(m.bends).toBe(0); // straight sides run on tangent into the corner arcs
    expect(m.minRadius).toBeCloseTo(0.25, 12);
  });

  // circle r = 48 px = 0.5 in: 2πr = π in, one curve. ellipse rx 96, ry 48 (2:1): the
  // Gauss–Kummer perimeter of a = 1, b = 0.5 in, 9.688448…/2.
  it('reads circle and ellipse as one closed curve each', () => {
    const c = metrics(svg('<circle id="cut" cx="100" cy="100" r="48"/>'));
    expect(c.length.cut).toBeCloseTo(Math.PI, 12);
    expect(c.curves).toBe(1);
    expect(c.closedContours).toBe(1);
    const e = metrics(svg('<ellipse id="cut" cx="100" cy="100" rx="96" ry="48"/>'));
    expect(e.length.cut / (9.688448220547675 / 2)).toBeCloseTo(1, 6);
    expect(e.curves).toBe(1);
    expect(e.minRadius).toBeCloseTo(0.25, 5); // b²/a = 0.25/1
  });

  // polyline (0,0)(96,0)(96,96): 2 in; polygon closes it back to (0,0): + √2 in.
  it('reads polyline and polygon', () => {
    expect(metrics(svg('<polyline id="cut" points="0,0 96,0 96,96"/>')).length.cut).toBeCloseTo(2, 12);
    expect(metrics(svg('<polygon id="cut" points="0 0 96 0 96 96"/>')).length.cut).toBeCloseTo(2 + Math.SQRT2, 12);
  });

  // path with relative and absolute commands: M0 0 h96 v96 H0 z is a 1 in square, 4 in.
  it('reads path', () => {
    const m = metrics(svg('<path id="cut" d="M0 0 h96 v96 H0 z"/>'));
    expect(m.length.cut).toBeCloseTo(4, 12);
    expect(m.bends).toBe(4);
  });
});

describe('readSvg transforms and units', () => {
  // Nested groups: translate(10 20) · scale(2) · rotate(30) on a 48 px line: length 48·2 = 96 px
  // = 1 in (translation and rotation keep lengths). A matrix(0 3 -3 0 0 0) is a rotation by 90°
  // with scale 3: 32 px → 96 px = 1 in. scale(2 1) on a circle r = 48 px gives an ellipse with
  // a = 1 in, b = 0.5 in (Gauss–Kummer perimeter 4.844224…).
  it('composes nested transforms', () => {
    const body =
      '<g id="cut" transform="translate(10 20)"><g transform="scale(2)"><line transform="rotate(30)" x1="0" y1="0" x2="48" y2="0"/></g></g>' +
      '<g id="crease" transform="matrix(0 3 -3 0 0 0)"><line x1="0" y1="0" x2="32" y2="0"/></g>' +
      '<g id="perf" transform="translate(500 0) scale(2 1)"><circle r="48"/></g>';
    const m = metrics(svg(body));
    expect(m.length.cut).toBeCloseTo(1, 12);
    expect(m.length.crease).toBeCloseTo(1, 12);
    expect(m.length.perf / (9.688448220547675 / 2)).toBeCloseTo(1, 6);
    // The rotated line from (10,20) at 30°: its box is 2 in·cos 30° × 2 in·sin 30° … of 1 in length.
    expect(m.bbox.width).toBeGreaterThan(0);
  });

  // W3C SVG 1.1 7.7: width="210mm" with viewBox 0 0 210 297 makes one user unit 1 mm. A 254-unit
  // line is 254 mm = 10 in (ISO 80000).
  it('reads a viewBox with a physical width (A4 in mm)', () => {
    const m = metrics(
      svg('<line id="cut" x1="0" y1="0" x2="254" y2="0"/>', 'width="210mm" height="297mm" viewBox="0 0 210 297"'),
    );
    expect(m.length.cut).toBeCloseTo(10, 12);
    expect(m.lengthMm.cut).toBeCloseTo(254, 9);
  });

  // width="8.5in" and viewBox 0 0 850 1100: 100 user units per inch; only one of width/height
  // is enough (the other follows the viewBox's aspect ratio).
  it('reads a viewBox with inches, from the width alone', () => {
    const m = metrics(svg('<line id="cut" x1="0" y1="0" x2="0" y2="350"/>', 'width="8.5in" viewBox="0 0 850 1100"'));
    expect(m.length.cut).toBeCloseTo(3.5, 12);
  });

  // preserveAspectRatio (default xMidYMid meet) takes the smaller scale: width 2in, height 1in,
  // viewBox 0 0 100 100 → 1 in per 100 units; with "none", x is 2 in per 100 units.
  it('meets the viewBox, or stretches it with "none"', () => {
    const line = '<line id="cut" x1="0" y1="0" x2="100" y2="0"/>';
    expect(metrics(svg(line, 'width="2in" height="1in" viewBox="0 0 100 100"')).length.cut).toBeCloseTo(1, 12);
    expect(
      metrics(svg(line, 'width="2in" height="1in" viewBox="0 0 100 100" preserveAspectRatio="none"')).length.cut,
    ).toBeCloseTo(2, 12);
  });

  // Without a viewBox, width="100mm" does not change user units: still 96 per inch.
  it('keeps 96 user units per inch without a viewBox', () => {
    expect(
      metrics(svg('<line id="cut" x1="0" y1="0" x2="96" y2="0"/>', 'width="100mm" height="100mm"')).length.cut,
    ).toBeCloseTo(1, 12);
  });

  // Geometry attributes may carry units: a rect 1in × 25.4mm is 1 × 1 in, perimeter 4 in.
  it('reads units on shape attributes', () => {
    expect(metrics(svg('<rect id="cut" width="1in" height="25.4mm"/>')).length.cut).toBeCloseTo(4, 12);
  });

  it('reads the fixture A4 label', () => {
    const m = metrics(readFileSync(new URL('../../fixtures/label-a4.svg', import.meta.url), 'utf8'));
    // 100 × 60 mm rect with r = 5 mm corners: 2·90 + 2·50 + 2π·5 mm; hole r = 3 mm: 2π·3 mm.
    expect(m.lengthMm.cut).toBeCloseTo(280 + 10 * Math.PI + 6 * Math.PI, 9);
    expect(m.lengthMm.crease).toBeCloseTo(60, 9); // the score line
    expect(m.lengthMm.other).toBeCloseTo(80, 9); // the artwork square, not priced
    expect(m.punches).toBe(1); // 6 mm hole ≤ 12.7 mm
    expect(m.joints).toBe(2); // the score ends on the label's top and bottom edges
  });
});

describe('readSvg labels', () => {
  it('takes the rule type from the nearest id, class or label', () => {
    const body =
      '<g inkscape:label="Crease lines"><path d="M0 0 H96"/><path class="cut outline" d="M0 50 H96"/></g>' +
      '<g data-name="Perforations"><g id="layer2"><line x2="96"/></g></g>' +
      '<g id="Kiss-cut"><line x2="192"/></g><path d="M0 0 V96"/>';
    const m = metrics(svg(body, 'xmlns:inkscape="http://www.inkscape.org/namespaces/inkscape"'));
    expect(m.length).toMatchObject({ crease: 1, cut: 1, perf: 1, kiss: 2, other: 1 });
    expect(m.layers.map((l) => `${l.name}:${l.ruleType}`).sort()).toEqual(
      ['(unnamed):other', 'Crease lines:crease', 'Kiss-cut:kiss', 'Perforations:perf', 'cut:cut'].sort(),
    );
  });

  it('lets a label be remapped', () => {
    const m = metrics(svg('<g id="artwork"><line x2="96"/></g>'), { layerMap: { ARTWORK: 'cut' } });
    expect(m.length.cut).toBe(1);
  });

  it('skips hidden elements and definitions, with a warning for hidden ones', () => {
    const body =
      '<defs><line id="cut" x2="960"/></defs><g style="display:none"><line id="cut" x2="960"/></g><line id="cut" x2="96"/>';
    const m = metrics(svg(body));
    expect(m.length.cut).toBe(1);
    expect(m.warnings).toContain('Hidden elements (display: none) were skipped.');
  });
});

describe('readSvg bad input', () => {
  it('refuses malformed XML with its line', () => {
    expect(fail('<svg xmlns="http://www.w3.org/2000/svg">\n<g><line x2="1"/></svg>')).toMatch(
      /^MALFORMED: The SVG file is not well-formed XML: .*\(line 2/,
    );
  });

  // fast-xml-parser throws a plain Error on a DOCTYPE with external entities: it must reach the
  // user as a dieline error, and the entity must never be expanded (OWASP XXE Prevention).
  it('refuses a DOCTYPE with external entities as a dieline error, without expanding them', () => {
    const xxe = `<?xml version="1.0"?>\n<!DOCTYPE svg [<!ENTITY xxe SYSTEM "file:///etc/passwd">]>\n${svg('<rect class="cut" width="96" height="96"/><text>&xxe;</text>')}`;
    expect(fail(xxe)).toMatch(/^MALFORMED: The SVG file could not be read: .*entit/i);
  });

  it('refuses a truncated SVG', () => {
    const good = svg('<g id="cut"><line x2="96"/><line x2="96" y2="5"/></g>');
    expect(fail(good.slice(0, good.length - 12))).toMatch(
      /^TRUNCATED: The SVG file ends before its elements are closed/,
    );
  });

  it('refuses an SVG with nothing to measure', () => {
    expect(fail(svg('<text>hello</text>'))).toMatch(/^NO_GEOMETRY: The drawing has no lines, arcs or curves/);
  });

  it('reads path data up to an error, with a warning', () => {
    const m = metrics(svg('<path id="cut" d="M0 0 H96 L 5 x"/>'));
    expect(m.length.cut).toBe(1);
    expect(m.warnings.join(' ')).toMatch(/Path data with an error was read up to the error/);
  });
});
