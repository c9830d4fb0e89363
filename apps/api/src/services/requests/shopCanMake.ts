import { BOARD_TOLERANCE_IN, type ShopCapabilities } from '@kerfmark/contracts';
import type { Knex } from 'knex';

/**
 * A where clause: the request `alias` is a die the shop can make by what the shop has said,
 * the same rule as `dieFit` in the contracts (a need the shop has not stated never excludes it;
 * the two are checked against each other in the test beside this file). The shop's figures are
 * parameters, read with the signed-in user, and an unstated one adds no condition at all: the
 * board runs this over every open request, so each row pays only for plain comparisons, and
 * the presses it may run on are listed once.
 */
export function shopCanMake(knex: Knex, shop: ShopCapabilities, alias: string) {
  const r = (column: string) => `${alias}.${column}`;
  return (q: Knex.QueryBuilder) => {
    const pressRules: string[] = [];
    const pressValues: Knex.RawBinding[] = [];
    if (shop.dieKinds.length) {
      pressRules.push(`(case when p.kind = 'rotary' then 'rotary' else 'flat' end) = any(?::text[])`);
      pressValues.push([...shop.dieKinds]);
    }
    if (shop.ruleHeightsIn.length) {
      pressRules.push('p.cutting_rule_height_in = any(?::numeric[])');
      pressValues.push([...shop.ruleHeightsIn]);
    }
    if (pressRules.length) {
      q.whereRaw(
        `(${r('press_id')} is null or ${r('press_id')} in (select p.id from presses p where ${pressRules.join(' and ')}))`,
        pressValues,
      );
    }
    const { maxBoardWidthIn: w, maxBoardLengthIn: l } = shop;
    if (w !== null && l !== null) {
      const [width, height] = [r('measured_board_width_in'), r('measured_board_height_in')];
      q.whereRaw(
        `(${width} is null or ${height} is null or (${width} <= ? and ${height} <= ?) or (${height} <= ? and ${width} <= ?))`,
        [w + BOARD_TOLERANCE_IN, l + BOARD_TOLERANCE_IN, w + BOARD_TOLERANCE_IN, l + BOARD_TOLERANCE_IN],
      );
    }
    if (shop.makesCounters === false) q.whereRaw(`not ${r('counter_wanted')}`);
    if (shop.fitsEjectionRubber === false) q.whereRaw(`not ${r('ejection_rubber_wanted')}`);
  };
}
