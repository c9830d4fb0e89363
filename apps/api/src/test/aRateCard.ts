import type { RateCardInput } from '@kerfmark/contracts';

/** A plain rate card in US cents (invented rates). */
export function aRateCard(overrides: Partial<RateCardInput> = {}): RateCardInput {
  return {
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
      { underDays: 3, factor: 1.5 },
      { underDays: 5, factor: 1.25 },
    ],
    ...overrides,
  };
}
