export { rectangleDxf } from '@kerfmark/dieline/testing';

/** 96 user units per inch (CSS Values and Units): a 192 × 96 rect is 2 × 1 in, perimeter 6 in. */
export const rectangleSvg = `<?xml version="1.0"?>
<svg xmlns="http://www.w3.org/2000/svg" width="192" height="96" viewBox="0 0 192 96">
  <g id="cut"><rect x="0" y="0" width="192" height="96" fill="none" stroke="black"/></g>
</svg>`;

/** The first bytes of a PNG image (PNG specification signature). */
export const pngBytes = Buffer.from([
  0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52,
]);

/** The date `days` from today, as YYYY-MM-DD. */
export const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/** A die shop's bid: the die and its shipping, in US dollars, 5 working days, the price held 30 days. */
export const bidBody = (dieCents: number, over: Record<string, unknown> = {}) => ({
  lines: [
    { kind: 'die', description: 'Steel-rule die, 3/4 in plywood', amountCents: dieCents },
    { kind: 'shipping', description: 'Ground', amountCents: 3_500 },
  ],
  currency: 'USD',
  leadDays: 5,
  validUntil: inDays(30),
  ...over,
});
