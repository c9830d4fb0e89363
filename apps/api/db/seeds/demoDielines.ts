// Dielines for the demo scenario, drawn from parameters as ASCII DXF (inches, $INSUNITS 1) on
// layers CUT, CREASE, PERF and KISS. The shapes and their proportions are our own, sized to
// plausible jobs; x runs right and y up.

type Layer = 'CUT' | 'CREASE' | 'PERF' | 'KISS';
type Pt = [x: number, y: number];
/** A polyline vertex; bulge = tan(θ/4) of the arc to the next vertex, positive counter-clockwise (DXF). */
type Vertex = [x: number, y: number, bulge?: number];

type Entity =
  | { kind: 'line'; layer: Layer; a: Pt; b: Pt }
  | { kind: 'circle'; layer: Layer; center: Pt; r: number }
  | { kind: 'outline'; layer: Layer; vertices: Vertex[] };

const QUARTER = Math.tan(Math.PI / 8); // bulge of a 90° arc
const HALF = 1; // bulge of a 180° arc

// ---- Tiny DXF helpers ----

const line = (layer: Layer, a: Pt, b: Pt): Entity => ({ kind: 'line', layer, a, b });
const circle = (layer: Layer, center: Pt, r: number): Entity => ({ kind: 'circle', layer, center, r });
const outline = (layer: Layer, vertices: Vertex[]): Entity => ({ kind: 'outline', layer, vertices });

function shifted(e: Entity, dx: number, dy: number): Entity {
  const move = ([x, y]: Pt): Pt => [x + dx, y + dy];
  if (e.kind === 'line') return { ...e, a: move(e.a), b: move(e.b) };
  if (e.kind === 'circle') return { ...e, center: move(e.center) };
  return { ...e, vertices: e.vertices.map(([x, y, bulge]) => [x + dx, y + dy, bulge]) };
}

/** Step and repeat one piece into a grid of ups, `across` along x and `along` along y. */
function grid(piece: Entity[], across: number, along: number, pitchX: number, pitchY: number): Entity[] {
  const out: Entity[] = [];
  for (let row = 0; row < along; row++) {
    for (let col = 0; col < across; col++) out.push(...piece.map((e) => shifted(e, col * pitchX, row * pitchY)));
  }
  return out;
}

function entityCodes(e: Entity): (string | number)[] {
  if (e.kind === 'line') return ['0', 'LINE', '8', e.layer, '10', e.a[0], '20', e.a[1], '11', e.b[0], '21', e.b[1]];
  if (e.kind === 'circle') return ['0', 'CIRCLE', '8', e.layer, '10', e.center[0], '20', e.center[1], '40', e.r];
  const codes: (string | number)[] = ['0', 'LWPOLYLINE', '8', e.layer, '90', e.vertices.length, '70', 1];
  for (const [x, y, bulge] of e.vertices) codes.push('10', x, '20', y, ...(bulge ? ['42', bulge] : []));
  return codes;
}

function toDxf(entities: Entity[]): string {
  const header = ['0', 'SECTION', '2', 'HEADER', '9', '$INSUNITS', '70', '1', '0', 'ENDSEC'];
  const body = ['0', 'SECTION', '2', 'ENTITIES', ...entities.flatMap(entityCodes), '0', 'ENDSEC', '0', 'EOF'];
  return [...header, ...body].map(String).join('\n') + '\n';
}

/** A w × h rectangle with corners of radius r, counter-clockwise from the bottom edge. */
function roundedRect(x: number, y: number, w: number, h: number, r: number): Vertex[] {
  return [
    [x + r, y],
    [x + w - r, y, QUARTER],
    [x + w, y + r],
    [x + w, y + h - r, QUARTER],
    [x + w - r, y + h],
    [x + r, y + h, QUARTER],
    [x, y + h - r],
    [x, y + r, QUARTER],
  ];
}

/** The same path mirrored in the line y = axis (mirroring turns each arc the other way). */
const mirroredY = (path: Vertex[], axis: number): Vertex[] => path.map(([x, y, b]) => [x, 2 * axis - y, -(b ?? 0)]);

/** The same path walked backwards: each arc's bulge moves to its other end and changes sign. */
const reversed = (path: Vertex[]): Vertex[] =>
  path.map(([x, y], i): Vertex => [x, y, -(path[i - 1]?.[2] ?? 0)]).reverse();

// ---- Shapes ----

// Carton proportions, common practice: a glue flap of about 5/8 in with tapered ends, a tuck
// tongue of about 3/4 in (less on a shallow carton), dust flaps reaching not quite halfway
// across the opening, a half-round thumb notch on the front panel.
const GLUE_FLAP_IN = 0.625;
const GLUE_TAPER_IN = 0.25;
const THUMB_NOTCH_RADIUS_IN = 0.375;

export interface TuckEndCartonSize {
  widthIn: number;
  depthIn: number;
  heightIn: number;
  ups: number;
  /** Space between blanks laid side by side. */
  gutterIn?: number;
}

/**
 * A straight tuck-end carton W × D × H, `ups` blanks side by side. Across: glue flap, front W,
 * side D, back W, side D. Both tuck flaps hang off the back panel (D tall plus a rounded tongue),
 * dust flaps off the sides; creasing rule on every fold.
 */
export function tuckEndCarton({ widthIn, depthIn, heightIn, ups, gutterIn = 0.25 }: TuckEndCartonSize): string {
  const blankWidth = GLUE_FLAP_IN + 2 * widthIn + 2 * depthIn;
  return toDxf(grid(tuckEndBlank(widthIn, depthIn, heightIn), ups, 1, blankWidth + gutterIn, 0));
}

function tuckEndBlank(w: number, d: number, h: number): Entity[] {
  // Fold lines across the blank, from the glue flap's fold to the right-hand edge.
  const front = GLUE_FLAP_IN;
  const side1 = front + w;
  const back = side1 + d;
  const side2 = back + w;
  const right = side2 + d;
  const tongue = Math.min(0.75, d / 2);
  const dust = w / 2 - 0.125;
  const taper = Math.min(dust, d) / 4; // dust flap sides lean in so they clear the tuck flap as they fold
  const notchAt = front + w / 2;
  const dustFlap = (x0: number, x1: number): Vertex[] => [
    [x0, h],
    [x0 + taper, h + dust],
    [x1 - taper, h + dust],
    [x1, h],
  ];
  // The top end, left to right; the bottom end is its mirror image.
  const top: Vertex[] = [
    [0, h - GLUE_TAPER_IN],
    [front, h],
    [notchAt - THUMB_NOTCH_RADIUS_IN, h, HALF],
    [notchAt + THUMB_NOTCH_RADIUS_IN, h],
    ...dustFlap(side1, back),
    [back, h + d, -QUARTER],
    [back + tongue, h + d + tongue],
    [side2 - tongue, h + d + tongue, -QUARTER],
    [side2, h + d],
    ...dustFlap(side2, right),
  ];
  const bottom = reversed(mirroredY(top, h / 2));
  return [
    outline('CUT', [...top, ...bottom]),
    ...[front, side1, back, side2].map((x) => line('CREASE', [x, 0], [x, h])),
    ...[0, h].map((y) => line('CREASE', [side1, y], [right, y])), // flap hinges
    ...[-d, h + d].map((y) => line('CREASE', [back, y], [side2, y])), // tongue folds
  ];
}

export interface LabelSheetLayout {
  across: number;
  along: number;
  widthIn: number;
  heightIn: number;
  cornerRadiusIn: number;
  gapIn: number;
}

const SHEET_MARGIN_IN = 0.5;

/** Rounded labels kiss cut through the face stock only, inside a sheet edge of cutting rule 1/2 in out. */
export function labelSheet({ across, along, widthIn, heightIn, cornerRadiusIn, gapIn }: LabelSheetLayout): string {
  const label = [outline('KISS', roundedRect(SHEET_MARGIN_IN, SHEET_MARGIN_IN, widthIn, heightIn, cornerRadiusIn))];
  const sheetWidth = across * widthIn + (across - 1) * gapIn + 2 * SHEET_MARGIN_IN;
  const sheetHeight = along * heightIn + (along - 1) * gapIn + 2 * SHEET_MARGIN_IN;
  return toDxf([
    outline('CUT', [
      [0, 0],
      [sheetWidth, 0],
      [sheetWidth, sheetHeight],
      [0, sheetHeight],
    ]),
    ...grid(label, across, along, widthIn + gapIn, heightIn + gapIn),
  ]);
}

export interface DoorHangerSize {
  widthIn: number;
  heightIn: number;
  holeDiameterIn: number;
  /** Height of the perforated tear-off coupon at the foot; none when left out. */
  couponHeightIn?: number;
}

const HANGER_CORNER_IN = 0.5;
const HANGER_HOLE_MARGIN_IN = 0.75; // from the top edge to the hole
const SLIT_ANGLE = Math.PI / 6; // the slit runs 30° down from the hole to the right edge

/** A door hanger: outline with rounded top corners, a hole for the knob with a slit to the edge, a perforated coupon. */
export function doorHanger({ widthIn: w, heightIn: h, holeDiameterIn, couponHeightIn }: DoorHangerSize): string {
  const r = holeDiameterIn / 2;
  const [cx, cy] = [w / 2, h - HANGER_HOLE_MARGIN_IN - r];
  const entities = [
    outline('CUT', [
      [0, 0],
      [w, 0],
      [w, h - HANGER_CORNER_IN, QUARTER],
      [w - HANGER_CORNER_IN, h],
      [HANGER_CORNER_IN, h, QUARTER],
      [0, h - HANGER_CORNER_IN],
    ]),
    circle('CUT', [cx, cy], r),
    line(
      'CUT',
      [cx + r * Math.cos(SLIT_ANGLE), cy - r * Math.sin(SLIT_ANGLE)],
      [w, cy - (w / 2) * Math.tan(SLIT_ANGLE)],
    ),
  ];
  if (couponHeightIn) entities.push(line('PERF', [0, couponHeightIn], [w, couponHeightIn]));
  return toDxf(entities);
}

export interface ShelfTalkerSize {
  widthIn: number;
  /** The face, below the tab. */
  heightIn: number;
  tabHeightIn: number;
  /** Height of the perforated tear-off coupon at the foot of the face. */
  couponHeightIn: number;
}

const TALKER_CORNER_IN = 0.25;
const TALKER_TAB_INSET_IN = 0.5;

/** A shelf talker: a face with rounded lower corners, a narrower tab on top folded on a crease, a perforated coupon. */
export function shelfTalker({ widthIn: w, heightIn: h, tabHeightIn, couponHeightIn }: ShelfTalkerSize): string {
  const [r, inset] = [TALKER_CORNER_IN, TALKER_TAB_INSET_IN];
  return toDxf([
    outline('CUT', [
      [r, 0],
      [w - r, 0, QUARTER],
      [w, r],
      [w, h],
      [w - inset, h],
      [w - inset, h + tabHeightIn],
      [inset, h + tabHeightIn],
      [inset, h],
      [0, h],
      [0, r, QUARTER],
    ]),
    line('CREASE', [inset, h], [w - inset, h]),
    line('PERF', [0, couponHeightIn], [w, couponHeightIn]),
  ]);
}

export interface PizzaBoxSize {
  /** The square base and lid. */
  sizeIn: number;
  /** Wall height. */
  depthIn: number;
}

const PIZZA_TUCK_CORNER_IN = 0.5;

/**
 * A one-piece corrugated pizza box, lid hinged at the back. Up the blank: front wall, base,
 * back wall, lid, lid tuck. Side walls beside the base; ears beside the front and back walls,
 * slit from the side walls, fold in behind them; lid side flaps with 45° ends. The lid's tuck and
 * side flaps are 1/4 in shallower than the walls so they fold inside them.
 */
export function pizzaBox({ sizeIn: s, depthIn: d }: PizzaBoxSize): string {
  const flap = d - 0.25;
  const rc = PIZZA_TUCK_CORNER_IN;
  const [x1, x2, x3] = [d, d + s, 2 * d + s];
  const [y1, y2, y3, y4] = [d, d + s, 2 * d + s, 2 * d + 2 * s];
  return toDxf([
    outline('CUT', [
      [0, 0],
      [x3, 0],
      [x3, y3],
      [x2, y3],
      [x2 + flap, y3 + flap],
      [x2 + flap, y4 - flap],
      [x2, y4],
      [x2, y4 + flap - rc, QUARTER],
      [x2 - rc, y4 + flap],
      [x1 + rc, y4 + flap, QUARTER],
      [x1, y4 + flap - rc],
      [x1, y4],
      [x1 - flap, y4 - flap],
      [x1 - flap, y3 + flap],
      [x1, y3],
      [0, y3],
    ]),
    // Slits parting the ears from the side walls.
    ...[y1, y2].flatMap((y) => [line('CUT', [0, y], [x1, y]), line('CUT', [x2, y], [x3, y])]),
    ...[x1, x2].map((x) => line('CREASE', [x, 0], [x, y4])),
    ...[y1, y2, y3, y4].map((y) => line('CREASE', [x1, y], [x2, y])),
  ]);
}

export interface HangTagLayout {
  across: number;
  along: number;
  widthIn: number;
  heightIn: number;
  cornerRadiusIn: number;
  holeDiameterIn: number;
  gapIn: number;
}

const TAG_HOLE_FROM_TOP_IN = 0.375; // to the hole's centre

/** Rounded hang tags cut out in a grid, each with a string hole punched near the top. */
export function hangTag({
  across,
  along,
  widthIn,
  heightIn,
  cornerRadiusIn,
  holeDiameterIn,
  gapIn,
}: HangTagLayout): string {
  const tag = [
    outline('CUT', roundedRect(0, 0, widthIn, heightIn, cornerRadiusIn)),
    circle('CUT', [widthIn / 2, heightIn - TAG_HOLE_FROM_TOP_IN], holeDiameterIn / 2),
  ];
  return toDxf(grid(tag, across, along, widthIn + gapIn, heightIn + gapIn));
}
