import { BOARD_TOLERANCE_IN } from '@kerfmark/contracts';
import type { Knex } from 'knex';

/**
 * A where clause: the request `alias` is a die the shop can make by what the shop has said,
 * the same rule as `dieFit` in the contracts (a need the shop has not stated never excludes it;
 * the two are checked against each other in the test beside this file).
 */
export function shopCanMake(knex: Knex, shopId: number, alias: string) {
  const r = (column: string) => `${alias}.${column}`;
  return knex.raw(
    `exists (select 1 from organisations s left join presses p on p.id = ${r('press_id')} where s.id = ?
      and (p.id is null or cardinality(s.die_kinds) = 0
           or (case when p.kind = 'rotary' then 'rotary' else 'flat' end) = any(s.die_kinds))
      and (p.id is null or cardinality(s.rule_heights_in) = 0 or p.cutting_rule_height_in = any(s.rule_heights_in))
      and (${r('measured_board_width_in')} is null or ${r('measured_board_height_in')} is null
           or s.max_board_width_in is null or s.max_board_length_in is null
           or (${r('measured_board_width_in')} <= s.max_board_width_in + ?
               and ${r('measured_board_height_in')} <= s.max_board_length_in + ?)
           or (${r('measured_board_height_in')} <= s.max_board_width_in + ?
               and ${r('measured_board_width_in')} <= s.max_board_length_in + ?))
      and (not ${r('counter_wanted')} or s.makes_counters is not false)
      and (not ${r('ejection_rubber_wanted')} or s.fits_ejection_rubber is not false))`,
    [shopId, BOARD_TOLERANCE_IN, BOARD_TOLERANCE_IN, BOARD_TOLERANCE_IN, BOARD_TOLERANCE_IN],
  );
}
