import { describe, expect, it } from 'vitest';
import { calibrateCard, type ReceivedDie } from './calibrateCard';
import { estimateFromCard, rushFactor, type EstimateDieline, type RateCard } from './rateCard';

// A worked example, every figure worked out by hand (cents, USD).
const card: RateCard = {
  currency: 'USD',
  rulePerInch: { cut: 410, crease: 320, perf: 450, kiss: 380 },
  perBend: 150,
  perJoint: 75,
  perPunch: 600,
  boardPerSqIn: [
    { thicknessIn: 0.625, perSqIn: 9 },
    { thicknessIn: 0.75, perSqIn: 11 },
  ],
  counterPerSqIn: 6,
  ejectionRubberPerSqIn: 4,
  setUp: 4500,
  minimumDie: 25_000,
  rush: [
    { underDays: 5, factor: 1.25 },
    { underDays: 3, factor: 1.5 },
  ],
};

const carton: EstimateDieline = {
  length: { cut: 79.3, crease: 24, perf: 0, kiss: 0 },
  bends: 12,
  joints: 6,
  punches: 2,
  board: { width: 14, height: 10 },
};

describe('estimate from a rate card', () => {
  it('prices each part of the die with its working, then rush, counter and rubber', () => {
    const e = estimateFromCard(card, { dieline: carton, counter: true, ejectionRubber: true, leadDays: 4 });
    expect(e.lines.map((l) => [l.kind, l.description, l.amount])).toEqual([
      ['die', 'Cutting rule: 79.3 in × $4.10', 32_513], // 79.3 × 410 = 32,513
      ['die', 'Creasing rule: 24.0 in × $3.20', 7_680],
      ['die', 'Bends: 12 × $1.50', 1_800],
      ['die', 'Joints to notch: 6 × $0.75', 450],
      ['die', 'Punches: 2 × $6.00', 1_200],
      ['die', 'Die board 0.625 in: 14.00 × 10.00 in = 140 sq in × $0.09', 1_260],
      ['die', 'Set-up', 4_500],
      // The die is 49,403; 4 working days is under 5, so × 1.25: 49,403 × 0.25 = 12,350.75.
      ['other', 'Rush: 4 working days, under 5 (die × 1.25)', 12_351],
      ['counter', 'Counter: 14.00 × 10.00 in = 140 sq in × $0.06', 840],
      ['ejection_rubber', 'Ejection rubber: 14.00 × 10.00 in = 140 sq in × $0.04', 560],
    ]);
    expect(e.total).toBe(49_403 + 12_351 + 840 + 560);
    expect(e.rushFactor).toBe(1.25);
  });

  it('tops a small die up to the minimum and takes the tightest rush band', () => {
    const small: EstimateDieline = {
      ...carton,
      length: { cut: 10, crease: 0, perf: 0, kiss: 0 },
      bends: 0,
      joints: 0,
      punches: 0,
      board: { width: 6, height: 5 },
    };
    const e = estimateFromCard(card, { dieline: small, counter: false, ejectionRubber: false, leadDays: 2 });
    // 10 × 410 + 30 sq in × 9 + 4,500 = 8,870; the minimum adds 16,130; under 3 days: × 1.5.
    expect(e.lines.find((l) => l.description.startsWith('Minimum'))?.amount).toBe(16_130);
    expect(e.lines.find((l) => l.kind === 'other')?.amount).toBe(12_500);
    expect(e.total).toBe(37_500);
  });

  it('prices the board chosen, and no rush at a normal lead time', () => {
    const e = estimateFromCard(card, {
      dieline: carton,
      counter: false,
      ejectionRubber: false,
      leadDays: 5,
      boardThicknessIn: 0.75,
    });
    expect(e.lines.find((l) => l.description.startsWith('Die board'))?.amount).toBe(140 * 11);
    expect(e.lines.some((l) => l.kind === 'other')).toBe(false);
    expect(rushFactor(card, 5)).toEqual({ factor: 1, underDays: null });
    expect(rushFactor(card, 0)).toEqual({ factor: 1.5, underDays: 3 });
  });
});

describe('calibrating a rate card against the dies the shop was paid for', () => {
  // The shop in fact charged 5.00/in of cutting rule, 3.00/in of creasing, 2.00 a bend, 1.00 a
  // joint, 7.00 a punch and 60.00 of set-up, plus the board at the card's 0.09 per sq in.
  const charged = (d: EstimateDieline) =>
    500 * d.length.cut +
    300 * d.length.crease +
    200 * d.bends +
    100 * d.joints +
    700 * d.punches +
    6000 +
    9 * d.board.width * d.board.height;
  const die = (
    cut: number,
    crease: number,
    bends: number,
    joints: number,
    punches: number,
    w: number,
    h: number,
  ): ReceivedDie => {
    const dieline = {
      length: { cut, crease, perf: 0, kiss: 0 },
      bends,
      joints,
      punches,
      board: { width: w, height: h },
    };
    return { dieline, diePrice: charged(dieline) };
  };
  const received = [
    die(80, 24, 12, 6, 2, 14, 10),
    die(120, 10, 20, 4, 0, 18, 12),
    die(45, 30, 8, 10, 6, 10, 8),
    die(200, 60, 40, 12, 1, 24, 18),
    die(64, 0, 4, 0, 0, 12, 10),
    die(150, 44, 30, 20, 8, 20, 16),
    die(95, 18, 16, 2, 3, 16, 12),
    die(30, 12, 6, 8, 0, 8, 8),
    die(175, 5, 22, 14, 4, 22, 14),
  ];

  it('recovers the rates actually charged, which the card undercuts', () => {
    const c = calibrateCard(card, received);
    // Exact data: least squares returns the generating rates (ordinary least squares is exact
    // on noise-free linear data with a full-rank design).
    expect(c.fit.enough).toBe(true);
    if (!c.fit.enough) return;
    expect(c.fit.suggested).toMatchObject({
      cut: 500,
      crease: 300,
      perBend: 200,
      perJoint: 100,
      perPunch: 700,
      setUp: 6000,
    });
    expect(c.fit.r2).toBeCloseTo(1, 9);
    // No perforating or kiss-cut rule in any die: those rates are kept from the card.
    expect(c.fit.suggested.perf).toBe(450);
    expect(c.fit.kept.sort()).toEqual(['kiss', 'perf']);
    // The first die: paid 40,000 + 7,200 + 2,400 + 600 + 1,400 + 6,000 + 1,260 = 58,860; the card
    // says 49,690 for the die alone (the worked example above with 80 in of cutting rule: + 0.7 × 410).
    expect(c.dies[0]).toEqual({ paid: 58_860, card: 49_690, ratio: 58_860 / 49_690 });
    expect(c.medianRatio!).toBeGreaterThan(1);
  });

  it('says so when there are too few dies to fit the rates', () => {
    const c = calibrateCard(card, received.slice(0, 3));
    expect(c.fit.enough).toBe(false);
    if (c.fit.enough) return;
    expect(c.fit.reason).toMatch(/^3 received dies cannot fit 6 rates/);
    expect(c.dies).toHaveLength(3);
  });
});
