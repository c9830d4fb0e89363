import { dieFit, dieKindOfPress, NOTHING_STATED, type ShopCapabilities } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { Organisation, Press } from '../../models';
import { actorOf, createOrg, createPress, createUser, knex } from '../../test/harness';
import { insertOpenRequest } from '../../test/insertOpenRequest';
import { shopCanMake } from './shopCanMake';

interface Die {
  press: Press | null;
  board: { width: number; height: number } | null;
  counterWanted: boolean;
  ejectionRubberWanted: boolean;
}

describe('shopCanMake', () => {
  it('keeps the measured board on the request row, from the primary file', async () => {
    const printer = await createOrg('printer');
    const buyer = await createUser(printer, 'buyer');
    const request = await insertOpenRequest(printer.id, buyer.id);
    const row = await knex('dieRequests').where({ id: request.id }).first();
    const file = await knex('dielineFiles').where({ requestId: request.id }).first('metrics');
    expect(row.measuredBoardWidthIn).toBe(file.metrics.board.width);
    expect(row.measuredBoardHeightIn).toBe(file.metrics.board.height);
  });

  it('says what dieFit says, for every shop and die', async () => {
    const printer = await createOrg('printer');
    const buyer = await createUser(printer, 'buyer');
    const platen = await createPress(printer);
    const rotary = await Press.query().patchAndFetchById((await createPress(printer)).id, {
      kind: 'rotary',
      cuttingRuleHeightIn: 0.918,
    });
    const dies: Die[] = [];
    for (const press of [null, platen, rotary])
      for (const board of [null, { width: 24, height: 30 }, { width: 41, height: 20 }])
        for (const counterWanted of [false, true])
          dies.push({ press, board, counterWanted, ejectionRubberWanted: !counterWanted });
    const ids: number[] = [];
    for (const die of dies) {
      const { id } = await insertOpenRequest(printer.id, buyer.id);
      await knex('dieRequests')
        .where({ id })
        .update({
          pressId: die.press?.id ?? null,
          counterWanted: die.counterWanted,
          ejectionRubberWanted: die.ejectionRubberWanted,
          measuredBoardWidthIn: die.board?.width ?? null,
          measuredBoardHeightIn: die.board?.height ?? null,
        });
      ids.push(id);
    }
    const shops: ShopCapabilities[] = [
      NOTHING_STATED,
      {
        dieKinds: ['flat'],
        maxBoardWidthIn: 28,
        maxBoardLengthIn: 40,
        ruleHeightsIn: [0.937],
        makesCounters: true,
        fitsEjectionRubber: true,
      },
      {
        dieKinds: ['rotary', 'flat'],
        maxBoardWidthIn: 20,
        maxBoardLengthIn: 24,
        ruleHeightsIn: [0.918, 0.937],
        makesCounters: false,
        fitsEjectionRubber: false,
      },
      {
        dieKinds: ['rotary'],
        maxBoardWidthIn: 20.004,
        maxBoardLengthIn: 41,
        ruleHeightsIn: [0.918],
        makesCounters: null,
        fitsEjectionRubber: false,
      },
    ];
    for (const capabilities of shops) {
      const shop = await createOrg('die_shop');
      await Organisation.query()
        .patch(capabilities as Partial<Organisation>)
        .findById(shop.id);
      // As the sign-in reads them: the board is kept to the hundredth of an inch, so 20.004 in is 20.00 in.
      const stored = actorOf(
        await createUser(shop, 'estimator'),
        (await Organisation.query().findById(shop.id))!,
      ).shopCapabilities!;
      const rows: Array<{ id: number }> = await knex('dieRequests as r')
        .whereIn('r.id', ids)
        .where(shopCanMake(knex, stored, 'r'))
        .select('r.id');
      const bySql = new Set(rows.map((row) => row.id));
      dies.forEach((die, i) => {
        const fit = dieFit(
          {
            dieKind: die.press ? dieKindOfPress(die.press.kind) : null,
            board: die.board,
            cuttingRuleHeightIn: die.press ? Number(die.press.cuttingRuleHeightIn) : null,
            counterWanted: die.counterWanted,
            ejectionRubberWanted: die.ejectionRubberWanted,
          },
          stored,
        );
        expect(
          bySql.has(ids[i]!),
          `${JSON.stringify(capabilities)} for ${JSON.stringify({ ...die, press: die.press?.kind })}`,
        ).toBe(fit.fits);
      });
    }
  });
});
