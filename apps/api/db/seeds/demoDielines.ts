// Dielines for the demo scenario, drawn in code as ASCII DXF (inches, $INSUNITS 1). Invented
// shapes: a tuck-end carton, a sheet of rounded labels and a door hanger.

type Vertex = [number, number, number?]; // x, y, bulge (tan of a quarter of the arc's angle)

const TAN_22_5 = Math.tan(Math.PI / 8); // bulge of a 90° arc

function header(): string[] {
  return ['0', 'SECTION', '2', 'HEADER', '9', '$INSUNITS', '70', '1', '0', 'ENDSEC', '0', 'SECTION', '2', 'ENTITIES'];
}

const line = (layer: string, x1: number, y1: number, x2: number, y2: number) =>
  ['0', 'LINE', '8', layer, '10', x1, '20', y1, '11', x2, '21', y2].map(String);

const circle = (layer: string, x: number, y: number, r: number) =>
  ['0', 'CIRCLE', '8', layer, '10', x, '20', y, '40', r].map(String);

function polyline(layer: string, vertices: Vertex[], closed: boolean): string[] {
  const out = ['0', 'LWPOLYLINE', '8', layer, '90', String(vertices.length), '70', closed ? '1' : '0'];
  for (const [x, y, bulge] of vertices) {
    out.push('10', String(x), '20', String(y));
    if (bulge) out.push('42', String(bulge));
  }
  return out;
}

const document = (entities: string[][]) => [...header(), ...entities.flat(), '0', 'ENDSEC', '0', 'EOF', ''].join('\n');

/** A rectangle with rounded corners of radius r, counter-clockwise from the bottom edge. */
function roundedRect(x: number, y: number, w: number, h: number, r: number): Vertex[] {
  return [
    [x + r, y],
    [x + w - r, y, TAN_22_5],
    [x + w, y + r],
    [x + w, y + h - r, TAN_22_5],
    [x + w - r, y + h],
    [x + r, y + h, TAN_22_5],
    [x, y + h - r],
    [x, y + r, TAN_22_5],
  ];
}

/** A straight tuck-end carton, 2.5 × 1.5 × 6 in, two up. */
export function tuckEndCarton(): string {
  const entities: string[][] = [];
  for (const dx of [0, 10]) {
    const w = 2.5,
      d = 1.5,
      h = 6,
      glue = 0.6,
      tuck = 1.2;
    const x0 = dx + glue;
    const panels = [x0, x0 + w, x0 + w + d, x0 + 2 * w + d, x0 + 2 * w + 2 * d];
    // Outline of cutting rule: glue flap, four panels, top and bottom closures.
    entities.push(
      polyline(
        'CUT',
        [
          [dx, 0.3],
          [x0, 0],
          [panels[1]!, 0],
          [panels[1]!, -d],
          [panels[1]! + 0.2, -d - tuck + 0.3, -TAN_22_5 / 2],
          [panels[2]! - 0.2, -d - tuck],
          [panels[2]!, -d],
          [panels[2]!, 0],
          [panels[4]!, 0],
          [panels[4]!, h],
          [panels[3]!, h],
          [panels[3]!, h + d],
          [panels[3]! - 0.2, h + d + tuck - 0.3, TAN_22_5 / 2],
          [panels[2]! + 0.2, h + d + tuck],
          [panels[2]!, h + d],
          [panels[2]!, h],
          [x0, h],
          [dx, h - 0.3],
        ],
        true,
      ),
    );
    // Creasing rule at every fold.
    for (const x of panels.slice(0, 4)) entities.push(line('CREASE', x, 0, x, h));
    entities.push(line('CREASE', panels[1]!, 0, panels[2]!, 0), line('CREASE', panels[2]!, h, panels[3]!, h));
    entities.push(line('CREASE', panels[1]!, -d, panels[2]!, -d), line('CREASE', panels[2]!, h + d, panels[3]!, h + d));
    // A thumb notch on the front panel.
    entities.push(circle('CUT', (panels[2]! + panels[3]!) / 2, h - 0.05, 0.2));
  }
  return document(entities);
}

/** A sheet of twelve 3.5 × 2 in labels with 1/8 in corners, kiss cut, inside a cut sheet edge. */
export function labelSheet(): string {
  const entities: string[][] = [
    polyline(
      'CUT',
      [
        [0, 0],
        [8.5, 0],
        [8.5, 11],
        [0, 11],
      ],
      true,
    ),
  ];
  for (let col = 0; col < 2; col++) {
    for (let row = 0; row < 6; row++) {
      entities.push(polyline('KISS-CUT', roundedRect(0.6 + col * 3.8, 0.45 + row * 1.7, 3.5, 1.5, 0.125), true));
    }
  }
  return document(entities);
}

/** A 4.25 × 11 in door hanger: a hole for the knob, a slit, and a perforated tear-off coupon. */
export function doorHanger(): string {
  return document([
    polyline(
      'CUT',
      [
        [0, 0],
        [4.25, 0],
        [4.25, 11, TAN_22_5],
        [3.25, 12],
        [1, 12, TAN_22_5],
        [0, 11],
      ],
      true,
    ),
    circle('CUT', 2.125, 10, 1.6),
    line('CUT', 2.125, 8.4, 4.25, 7.2),
    line('PERF', 0, 3, 4.25, 3),
    circle('CUT', 3.8, 11.3, 0.12),
  ]);
}
