import type { HolidayDto } from '@kerfmark/contracts';
import type { ShopHoliday } from '../../models';

/** A holiday as the API answers it; `today` is the shop's, to mark the days gone by. */
export function toHolidayDto(
  row: Pick<ShopHoliday, 'id' | 'date' | 'name' | 'source' | 'country' | 'region'>,
  today: string,
): HolidayDto {
  return {
    id: row.id,
    date: String(row.date),
    name: row.name,
    source: row.source,
    country: row.country ?? null,
    region: row.region ?? null,
    past: String(row.date) < today,
  };
}
