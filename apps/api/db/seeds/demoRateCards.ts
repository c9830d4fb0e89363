// Each demo die shop's rate card: invented rates, scaled so the card prices the shop's received
// demo dies about as the shop was paid for them (the card's calibration then reads close to 1).
import type { RateCardInput } from '@kerfmark/contracts';
import { calibrateCard } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { receivedDies } from '../../src/services/rateCards/receivedDies';

/** Invented shapes of card: one dear on rule, one dear on features, one in between. */
const baseCards: Record<string, Omit<RateCardInput, 'currency'>> = {
  'Brightline Rule & Die': {
    rulePerInch: { cut: 520, crease: 380, perf: 560, kiss: 450 },
    perBend: 120,
    perJoint: 90,
    perPunch: 650,
    boardPerSqIn: [
      { thicknessIn: 0.625, perSqIn: 9 },
      { thicknessIn: 0.75, perSqIn: 12 },
    ],
    counterPerSqIn: 7,
    ejectionRubberPerSqIn: 4,
    setUp: 6500,
    minimumDie: 30_000,
    rush: [
      { underDays: 3, factor: 1.5 },
      { underDays: 5, factor: 1.2 },
    ],
  },
  'Okafor Steel Rule Dies': {
    rulePerInch: { cut: 430, crease: 330, perf: 480, kiss: 400 },
    perBend: 180,
    perJoint: 110,
    perPunch: 800,
    boardPerSqIn: [{ thicknessIn: 0.625, perSqIn: 8 }],
    counterPerSqIn: 6,
    ejectionRubberPerSqIn: 5,
    setUp: 5000,
    minimumDie: 22_500,
    rush: [{ underDays: 4, factor: 1.35 }],
  },
  'Cedar Bend Die Works': {
    rulePerInch: { cut: 470, crease: 350, perf: 500, kiss: 420 },
    perBend: 140,
    perJoint: 80,
    perPunch: 700,
    boardPerSqIn: [
      { thicknessIn: 0.625, perSqIn: 10 },
      { thicknessIn: 0.75, perSqIn: 13 },
    ],
    counterPerSqIn: 6,
    ejectionRubberPerSqIn: 4,
    setUp: 5500,
    minimumDie: 25_000,
    rush: [
      { underDays: 2, factor: 1.75 },
      { underDays: 4, factor: 1.3 },
    ],
  },
};

/** Every rate of the card times k, in whole minor units (the board too, so the whole die scales). */
function scaled(card: Omit<RateCardInput, 'currency'>, k: number): Omit<RateCardInput, 'currency'> {
  const r = (v: number) => Math.round(v * k);
  return {
    ...card,
    rulePerInch: {
      cut: r(card.rulePerInch.cut),
      crease: r(card.rulePerInch.crease),
      perf: r(card.rulePerInch.perf),
      kiss: r(card.rulePerInch.kiss),
    },
    perBend: r(card.perBend),
    perJoint: r(card.perJoint),
    perPunch: r(card.perPunch),
    boardPerSqIn: card.boardPerSqIn.map((b) => ({ ...b, perSqIn: r(b.perSqIn) })),
    setUp: r(card.setUp),
  };
}

export async function seedRateCards(knex: Knex): Promise<void> {
  for (const [name, base] of Object.entries(baseCards)) {
    const shop = await knex('organisations').where({ name }).first();
    if (!shop || (await knex('rateCards').where({ organisationId: shop.id }).first())) continue;
    const admin = await knex('users').where({ organisationId: shop.id, role: 'admin' }).first();
    const received = await receivedDies(knex, shop.id, 'USD');
    const k = calibrateCard({ currency: 'USD', ...base }, received).medianRatio ?? 1;
    await knex('rateCards').insert({
      organisationId: shop.id,
      currency: 'USD',
      rates: JSON.stringify(scaled(base, k)),
      updatedBy: admin?.id ?? null,
    });
  }
}
