import { describe, it, expect } from 'vitest';
import { analyseDieline, analyseDielineAsync, type DielineMetrics } from '@kerfmark/dieline';
import { doorHanger, hangTag, labelSheet, pizzaBox, shelfTalker, tuckEndCarton } from './demoDielines';
import { demoOrganisations } from './demoPeople';
import { demoRequests } from './demoRequests';
import { soapSleevePdf } from './demoPdfDielines';

// Every expected number below is worked out by hand from the shape's geometry (straight runs,
// arc length rθ, circle circumference 2πr: geometry), not from the generator's code.

const PI = Math.PI;
const measure = (dxf: string): DielineMetrics => analyseDieline(dxf).metrics;

type DemoRequest = (typeof demoRequests)[number];
/** The DXF text of a demo request drawn as DXF. */
function dxfOf(demo: DemoRequest): string {
  const content = demo.dieline.content();
  if (typeof content !== 'string') throw new Error(`${demo.title} is not a DXF`);
  return content;
}
const dxfRequests = demoRequests.filter((r) => r.dieline.name.endsWith('.dxf'));

function request(jobReference: string) {
  const found = demoRequests.find((r) => r.jobReference === jobReference);
  if (!found) throw new Error(`No demo request ${jobReference}`);
  return found;
}

// The received dies in demoHistory.ts, with the same parameters (its list is not exported).
const history = {
  'Pizza box, 1 up': () => pizzaBox({ sizeIn: 10, depthIn: 1.75 }),
  'Shelf talker with perforation': () =>
    shelfTalker({ widthIn: 4, heightIn: 5, tabHeightIn: 1.25, couponHeightIn: 1.5 }),
  'Sample-pack label sheet': () =>
    labelSheet({ across: 4, along: 3, widthIn: 2, heightIn: 3, cornerRadiusIn: 0.25, gapIn: 0.125 }),
  'Folding carton for candles': () => tuckEndCarton({ widthIn: 3.25, depthIn: 3.25, heightIn: 3.75, ups: 1 }),
  'Hang tag, 12 up': () =>
    hangTag({
      across: 4,
      along: 3,
      widthIn: 2,
      heightIn: 3.5,
      cornerRadiusIn: 0.25,
      holeDiameterIn: 0.1875,
      gapIn: 0.125,
    }),
  'Hotel door hanger': () => doorHanger({ widthIn: 3.5, heightIn: 9, holeDiameterIn: 1.625 }),
};

/**
 * Rule length of one straight tuck-end blank W × D × H, by hand (geometry), with the carton
 * proportions of common practice the generator uses: glue flap 0.625 in with ends tapered
 * 0.25 in, thumb notch a half circle of r 0.375, tongue T = min(0.75, D/2) with corners of
 * radius T, dust flaps F = W/2 − 0.125 tall with sides tapered s = min(F, D)/4.
 */
function tuckEndBlankLengths(w: number, d: number, h: number) {
  const t = Math.min(0.75, d / 2);
  const f = w / 2 - 0.125;
  const s = Math.min(f, d) / 4;
  const oneEnd =
    Math.hypot(0.625, 0.25) + // glue flap's tapered end
    (w - 2 * 0.375) + // front panel edge beside the notch
    PI * 0.375 + // half-round thumb notch, πr
    2 * (2 * Math.hypot(s, f) + (d - 2 * s)) + // two dust flaps: tapered sides and top
    2 * d + // the tuck flap's sides
    2 * (PI / 2) * t + // two quarter-circle tongue corners
    (w - 2 * t); // the tongue's straight edge
  return {
    // Both ends, the right-hand edge H and the glue flap's edge H − 2 × 0.25.
    cut: 2 * oneEnd + h + (h - 0.5),
    // Four panel folds H; at each end the flap hinges D + W + D and the tongue fold W.
    crease: 4 * h + 2 * (d + w + d) + 2 * w,
  };
}

describe('tuckEndCarton', () => {
  it('draws the 2.5 × 1.5 × 6 in straight tuck-end carton two up, every fold creased', () => {
    const m = measure(dxfOf(request('LPC-24117')));
    const blank = tuckEndBlankLengths(2.5, 1.5, 6);
    expect(blank.cut).toBeCloseTo(44.44186, 4); // by hand: 2 × 16.47094 + 6 + 5.5
    expect(m.length.cut).toBeCloseTo(2 * blank.cut, 6);
    expect(m.length.crease).toBeCloseTo(2 * (4 * 6 + 2 * (1.5 + 2.5 + 1.5) + 2 * 2.5), 6); // 80 in
    expect(m.length.perf + m.length.kiss + m.length.other).toBe(0);
    expect(m.closedContours).toBe(2); // one outline per up
    expect(m.punches).toBe(0);
    // Across: 2 blanks of 0.625 + 2(2.5) + 2(1.5) = 8.625 with a 0.25 gutter; up: H + 2(D + T).
    expect(m.bbox.width).toBeCloseTo(2 * 8.625 + 0.25, 9);
    expect(m.bbox.height).toBeCloseTo(6 + 2 * (1.5 + 0.75), 9);
    // Per blank: 2 thumb notches + 4 tongue corners; the notch is the tightest radius.
    expect(m.curves).toBe(2 * 6);
    expect(m.minRadius).toBeCloseTo(0.375, 9);
    expect(m.warnings).toEqual([]);
  });

  it('draws the tea carton 3 × 2.5 × 5.25 in two up', () => {
    const m = measure(dxfOf(request('TPF-0871')));
    const blank = tuckEndBlankLengths(3, 2.5, 5.25);
    expect(m.length.cut).toBeCloseTo(2 * blank.cut, 6);
    expect(m.length.crease).toBeCloseTo(2 * (4 * 5.25 + 2 * (2.5 + 3 + 2.5) + 2 * 3), 6); // 86 in
    expect(m.closedContours).toBe(2);
    expect(m.bbox.width).toBeCloseTo(2 * (0.625 + 6 + 5) + 0.25, 9); // 23.5 in
    expect(m.bbox.height).toBeCloseTo(5.25 + 2 * (2.5 + 0.75), 9);
  });

  it('draws the candle carton 3.25 × 3.25 × 3.75 in one up', () => {
    const m = measure(history['Folding carton for candles']());
    const blank = tuckEndBlankLengths(3.25, 3.25, 3.75);
    expect(m.length.cut).toBeCloseTo(blank.cut, 6);
    expect(m.length.crease).toBeCloseTo(4 * 3.75 + 2 * (3.25 * 3) + 2 * 3.25, 6); // 41 in
    expect(m.closedContours).toBe(1); // one up
    expect(m.bbox.width).toBeCloseTo(0.625 + 4 * 3.25, 9);
    expect(m.bbox.height).toBeCloseTo(3.75 + 2 * (3.25 + 0.75), 9);
  });
});

describe('labelSheet', () => {
  it('kiss cuts twelve 3.5 × 1.5 in labels with 1/8 in corners, 2 across × 6 along', () => {
    const demo = request('LPC-24130');
    const m = measure(dxfOf(demo));
    // One label: 2(3.5 + 1.5) − 8r + 2πr with r = 0.125 (four straight sides, four quarter circles).
    const label = 2 * (3.5 + 1.5) - 8 * 0.125 + 2 * PI * 0.125;
    expect(m.length.kiss).toBeCloseTo(12 * label, 6);
    // Sheet edge: labels, 0.25 in gaps and a 0.5 in margin: 2(3.5) + 0.25 + 1 by 6(1.5) + 5(0.25) + 1.
    expect(m.length.cut).toBeCloseTo(2 * (8.25 + 11.25), 6);
    expect(m.bbox.width).toBeCloseTo(8.25, 9);
    expect(m.bbox.height).toBeCloseTo(11.25, 9);
    expect(m.closedContours).toBe(2 * 6 + 1); // across × along labels and the sheet edge
    expect(m.closedContours - 1).toBe(demo.fields.ups);
    expect(m.minRadius).toBeCloseTo(0.125, 9);
    expect(m.warnings).toEqual([]);
  });

  it('kiss cuts the sample-pack sheet: twelve 2 × 3 in labels, 4 across × 3 along, 1/4 in corners', () => {
    const m = measure(history['Sample-pack label sheet']());
    expect(m.length.kiss).toBeCloseTo(12 * (2 * (2 + 3) - 8 * 0.25 + 2 * PI * 0.25), 6);
    // 4(2) + 3(0.125) + 1 = 9.375 by 3(3) + 2(0.125) + 1 = 10.25.
    expect(m.length.cut).toBeCloseTo(2 * (9.375 + 10.25), 6);
    expect(m.closedContours).toBe(4 * 3 + 1);
  });
});

describe('doorHanger', () => {
  it('draws the 4.25 × 12 in hanger: hole, slit and a perforated coupon 3 in up', () => {
    const demo = request('LPC-24152');
    const m = measure(dxfOf(demo));
    // Outline with two 0.5 in top corners: 2(4.25 + 12) − 4r + πr; hole 2 in across: π × 2; the
    // slit runs 30° down from the hole's centre, at 4.25/2 from the edge: 2.125 / cos 30° − 1.
    const outline = 2 * (4.25 + 12) - 4 * 0.5 + PI * 0.5;
    const slit = 2.125 / Math.cos(PI / 6) - 1;
    expect(slit).toBeCloseTo(1.45374, 4); // by hand: 2.125 / 0.86603 − 1
    expect(m.length.cut).toBeCloseTo(outline + PI * 2 + slit, 6);
    expect(m.length.perf).toBeCloseTo(4.25, 9); // straight across the width
    expect(m.closedContours).toBe(2 * Number(demo.fields.ups)); // the outline and the hole, one up
    expect(m.punches).toBe(0); // the knob hole is larger than a punch
    expect(m.bbox).toEqual({ width: 4.25, height: 12 });
    expect(m.warnings).toEqual([]);
  });

  it('draws the hotel hanger, 3.5 × 9 in with a 1 5/8 in hole and no coupon', () => {
    const m = measure(history['Hotel door hanger']());
    const slit = 1.75 / Math.cos(PI / 6) - 1.625 / 2;
    expect(m.length.cut).toBeCloseTo(2 * (3.5 + 9) - 4 * 0.5 + PI * 0.5 + PI * 1.625 + slit, 6);
    expect(m.length.perf).toBe(0);
    expect(m.closedContours).toBe(2);
  });
});

describe('shelfTalker', () => {
  it('draws a 4 × 5 in face with a 1.25 in tab folded on a crease and a perforated 1.5 in coupon', () => {
    const m = measure(history['Shelf talker with perforation']());
    // Face: bottom 4 − 2r, sides 2(5 − r), two quarter circles πr with r = 0.25; shoulders 2 × 0.5
    // beside the tab; the tab 2 × 1.25 up and 4 − 2(0.5) across.
    const cut = 4 - 0.5 + 2 * (5 - 0.25) + PI * 0.25 + 2 * 0.5 + 2 * 1.25 + 3;
    expect(cut).toBeCloseTo(20.2854, 4); // by hand: 19.5 + 0.78540
    expect(m.length.cut).toBeCloseTo(cut, 6);
    expect(m.length.crease).toBeCloseTo(4 - 2 * 0.5, 9); // the tab's fold, across the tab only
    expect(m.length.perf).toBeCloseTo(4, 9); // the coupon line across the face
    expect(m.closedContours).toBe(1);
    expect(m.bbox.width).toBeCloseTo(4, 9);
    expect(m.bbox.height).toBeCloseTo(5 + 1.25, 9);
    expect(m.warnings).toEqual([]);
  });
});

describe('pizzaBox', () => {
  it('draws a 10 in pizza box with 1.75 in walls in one piece', () => {
    const m = measure(history['Pizza box, 1 up']());
    const [s, d, flap, r] = [10, 1.75, 1.5, 0.5]; // lid flaps 1/4 in under the wall; tuck corners r
    const outline =
      (2 * d + s) * 3 + // bottom edge and both side edges up to the lid
      2 * d + // tops of the back ears
      4 * Math.SQRT2 * flap + // 45° ends of the two lid side flaps
      2 * (s - 2 * flap) + // the side flaps' edges
      2 * (flap - r) + // the tuck's sides
      PI * r + // two quarter-circle tuck corners
      (s - 2 * r); // the tuck's edge
    expect(m.length.cut).toBeCloseTo(outline + 4 * d, 6); // and four slits parting ears from side walls
    // Two long folds through ears, side walls and lid flaps (2d + 2s each), four folds across (s each).
    expect(m.length.crease).toBeCloseTo(2 * (2 * d + 2 * s) + 4 * s, 9); // 87 in
    expect(m.closedContours).toBe(1);
    expect(m.bbox.width).toBeCloseTo(2 * d + s, 9);
    expect(m.bbox.height).toBeCloseTo(2 * d + 2 * s + flap, 9);
    expect(m.warnings).toEqual([]);
  });
});

describe('hangTag', () => {
  it('cuts twelve 2 × 3.5 in tags, 4 across × 3 along, each with a punched 3/16 in hole', () => {
    const m = measure(history['Hang tag, 12 up']());
    const tag = 2 * (2 + 3.5) - 8 * 0.25 + 2 * PI * 0.25; // rounded outline, r = 0.25
    expect(m.length.cut).toBeCloseTo(12 * (tag + PI * 0.1875), 6);
    expect(m.closedContours).toBe(2 * 12); // an outline and a hole per tag
    expect(m.punches).toBe(12); // a hole under 0.5 in each way is a punch
    expect(m.minRadius).toBeCloseTo(0.1875 / 2, 9);
    expect(m.bbox.width).toBeCloseTo(4 * 2 + 3 * 0.125, 9);
    expect(m.bbox.height).toBeCloseTo(3 * 3.5 + 2 * 0.125, 9);
  });
});

// ---- Every demo dieline ----

const allDemoDielines = (): Array<[string, string]> => [
  ...dxfRequests.map((r): [string, string] => [r.title, dxfOf(r)]),
  ...Object.entries(history).map(([title, draw]): [string, string] => [title, draw()]),
];

describe('the demo dielines', () => {
  it('gives every demo request and received die a dieline of its own', () => {
    const drawings = allDemoDielines();
    expect(drawings).toHaveLength(dxfRequests.length + 6);
    expect(new Set(drawings.map(([, dxf]) => dxf)).size).toBe(drawings.length);
  });

  it('draws as many ups as each demo request asks for', () => {
    // Closed contours per request: one outline per carton; one per label plus the sheet edge; a
    // door hanger's outline and its hole.
    const upsDrawn: Record<string, (m: DielineMetrics) => number> = {
      'LPC-24117': (m) => m.closedContours,
      'LPC-24130': (m) => m.closedContours - 1,
      'LPC-24152': (m) => m.closedContours / 2,
      'TPF-0871': (m) => m.closedContours,
    };
    for (const [jobReference, count] of Object.entries(upsDrawn)) {
      const demo = request(jobReference);
      expect(count(measure(dxfOf(demo))), demo.title).toBe(demo.fields.ups);
    }
  });

  it("fits each demo request's die board on the request's press", () => {
    const presses = demoOrganisations.flatMap((o) => o.presses ?? []);
    for (const demo of dxfRequests) {
      const press = presses.find((p) => p.name === demo.press)!;
      const { metrics } = analyseDieline(dxfOf(demo), {
        press: { widthIn: press.maxSheetWidthIn, lengthIn: press.maxSheetLengthIn },
      });
      expect(metrics.fitsPress, demo.title).toBe(true);
    }
  });

  it('ends every creasing and perforating rule on a cutting rule', () => {
    for (const [title, dxf] of allDemoDielines()) {
      const rules = readOwnDxf(dxf);
      const cuts = rules.filter((r) => r.layer === 'CUT');
      const loose = rules
        .filter((r) => r.layer === 'CREASE' || r.layer === 'PERF')
        .flatMap((r) => [r.a, r.b])
        .filter((p) => !cuts.some((c) => touches(c, p)));
      expect(loose, title).toEqual([]);
    }
  });

  it('has no two straight rules crossing', () => {
    for (const [title, dxf] of allDemoDielines()) {
      const straight = readOwnDxf(dxf).filter((r) => r.kind === 'line' && !r.bulge);
      const crossings: string[] = [];
      straight.forEach((r, i) =>
        straight.slice(i + 1).forEach((q) => {
          if (cross(r.a, r.b, q.a, q.b)) crossings.push(`${r.layer} ${r.a} – ${r.b} × ${q.layer} ${q.a} – ${q.b}`);
        }),
      );
      expect(crossings, title).toEqual([]);
    }
  });
});

// ---- A reader for the DXF these generators write (LINE, CIRCLE, closed LWPOLYLINE) ----

type P = [number, number];
interface Rule {
  layer: string;
  kind: 'line' | 'circle';
  a: P;
  b: P;
  /** Arc bulge of a polyline segment, 0 for straight; r and centre a for a circle. */
  bulge: number;
  r: number;
}

function readOwnDxf(dxf: string): Rule[] {
  const lines = dxf.split('\n');
  const entities: Array<Array<[string, string]>> = [];
  for (let i = 0; i + 1 < lines.length; i += 2) {
    const pair: [string, string] = [lines[i]!.trim(), lines[i + 1]!.trim()];
    if (pair[0] === '0') entities.push([]);
    entities.at(-1)?.push(pair);
  }
  return entities.flatMap((groups) => {
    const value = (code: string) => Number(groups.find(([c]) => c === code)?.[1]);
    const type = groups[0]?.[1];
    const layer = groups.find(([c]) => c === '8')?.[1] ?? '';
    if (type === 'LINE') {
      return [{ layer, kind: 'line', a: [value('10'), value('20')], b: [value('11'), value('21')], bulge: 0, r: 0 }];
    }
    if (type === 'CIRCLE') {
      const c: P = [value('10'), value('20')];
      return [{ layer, kind: 'circle', a: c, b: c, bulge: 0, r: value('40') }];
    }
    if (type !== 'LWPOLYLINE') return [];
    const vertices: Array<{ p: P; bulge: number }> = [];
    for (const [code, v] of groups) {
      if (code === '10') vertices.push({ p: [Number(v), NaN], bulge: 0 });
      if (code === '20') vertices.at(-1)!.p[1] = Number(v);
      if (code === '42') vertices.at(-1)!.bulge = Number(v);
    }
    return vertices.map(({ p, bulge }, i): Rule => {
      const next = vertices[(i + 1) % vertices.length]!.p;
      return { layer, kind: 'line', a: p, b: next, bulge, r: 0 };
    });
  });
}

const TOL = 1e-6;

/** Point p lies on rule r: a straight segment, a circle, or (for arcs) one of the arc's ends. */
function touches(r: Rule, p: P): boolean {
  const d = (u: P, v: P) => Math.hypot(u[0] - v[0], u[1] - v[1]);
  if (r.kind === 'circle') return Math.abs(d(r.a, p) - r.r) < TOL;
  if (r.bulge) return d(r.a, p) < TOL || d(r.b, p) < TOL; // arcs' interiors are not checked
  const [dx, dy] = [r.b[0] - r.a[0], r.b[1] - r.a[1]];
  const t = Math.max(0, Math.min(1, ((p[0] - r.a[0]) * dx + (p[1] - r.a[1]) * dy) / (dx * dx + dy * dy)));
  return d(p, [r.a[0] + t * dx, r.a[1] + t * dy]) < TOL;
}

/** Segments ab and cd cross properly: each passes strictly through the other (touching is not crossing). */
function cross(a: P, b: P, c: P, d: P): boolean {
  const side = (p: P, q: P, r: P) => (q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]);
  return side(a, b, c) * side(a, b, d) < -TOL && side(c, d, a) * side(c, d, b) < -TOL;
}

describe('the one-up PDF demo dieline (written by pdfkit)', () => {
  // One sleeve: panels 3.5, 1.25, 3.5, 1.25 in after a 0.5 in glue flap tapered by 0.2 in, 2.5 in
  // tall. Cutting rule: top and bottom 9.5 in each, the far end 2.5 in, the glue flap's end
  // 2.5 − 2 × 0.2 = 2.1 in and its two tapers √(0.5² + 0.2²) each (geometry). Four creases of 2.5 in.
  const taper = Math.hypot(0.5, 0.2);
  const oneUpCut = 9.5 + 9.5 + 2.5 + 2.1 + 2 * taper;

  it('measures one up by its Cut and Crease separations, leaving out the artwork and caption', async () => {
    const { metrics } = await analyseDielineAsync(await soapSleevePdf({ widthIn: 3.5, depthIn: 1.25, heightIn: 2.5 }));
    expect(metrics.length.cut).toBeCloseTo(oneUpCut, 6);
    expect(metrics.length.crease).toBeCloseTo(10, 6);
    expect(metrics.bbox.width).toBeCloseTo(10, 6);
    expect(metrics.bbox.height).toBeCloseTo(2.5, 6);
    expect(metrics.warnings.join(' ')).toMatch(/filled shape/);
  });

  it('lays the request out 2 across × 5 along with shared cuts, and the whole die fits the platen', async () => {
    const demo = request('LPC-24168');
    expect(demo.fields.ups).toBe(10);
    const { metrics } = await analyseDielineAsync(await demo.dieline.content(), {
      press: { widthIn: 22, lengthIn: 30 },
      layout: { across: 2, along: 5, gutterIn: 0, pieceGrain: 'with-height', sheetGrain: 'long' },
    });
    // Ten sleeves, less what neighbours share: 4 row boundaries × 2 sleeves × 9.5 in, and the
    // glue-flap end (2.1 in) lying on the next sleeve's far end in each of the 5 rows.
    expect(metrics.length.cut).toBeCloseTo(10 * oneUpCut - 4 * 2 * 9.5 - 5 * 2.1, 6);
    expect(metrics.length.crease).toBeCloseTo(10 * 10, 6);
    expect(metrics.bbox.width).toBeCloseTo(20, 6);
    expect(metrics.bbox.height).toBeCloseTo(12.5, 6);
    expect(metrics.fitsPress).toBe(true);
    expect(metrics.layout?.rotated).toBe(false);
  });
});
