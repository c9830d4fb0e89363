import { Model } from 'objection';
import type { HolidaySource } from '@kerfmark/contracts';

/** A day a die shop does not work: one of its country's public holidays, or a closure of its own. */
export class ShopHoliday extends Model {
  static override tableName = 'shop_holidays';

  id!: number;
  shopId!: number;
  /** A calendar date, 'YYYY-MM-DD'. */
  date!: string;
  name!: string;
  source!: HolidaySource;
  country!: string | null;
  region!: string | null;
  createdBy!: number | null;
  createdAt!: Date;
  /** Set when the shop removed a public holiday: it works that day, and a second load leaves it off. */
  removedAt!: Date | null;
}
