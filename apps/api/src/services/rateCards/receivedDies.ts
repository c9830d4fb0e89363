import type { ReceivedDie } from '@kerfmark/pricing';
import type { Knex } from 'knex';

/**
 * The dies a shop made and was paid for in one currency, from its price records, oldest first.
 * The record keeps the board's area, not its sides: an area-by-1 board prices the same.
 */
export async function receivedDies(knex: Knex, shopId: number, currency: string): Promise<ReceivedDie[]> {
  const rows = await knex('priceRecords')
    .where({ shopId, currency, source: 'award' })
    .orderBy('pricedOn')
    .select('dieCents', 'cutIn', 'creaseIn', 'perfIn', 'kissIn', 'bends', 'joints', 'punches', 'boardAreaSqIn');
  return rows.map((r) => ({
    diePrice: Number(r.dieCents),
    dieline: {
      length: { cut: Number(r.cutIn), crease: Number(r.creaseIn), perf: Number(r.perfIn), kiss: Number(r.kissIn) },
      bends: Number(r.bends),
      joints: Number(r.joints),
      punches: Number(r.punches),
      board: { width: Number(r.boardAreaSqIn), height: 1 },
    },
  }));
}
