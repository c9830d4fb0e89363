import { describe, expect, it } from 'vitest';
import type { Organisation } from '../../models';
import { dueDateFor } from './dueDate';

const printer = (paymentTerms: string | null, paymentNetDays: number | null) =>
  ({ name: 'Lakeside Print', paymentTerms, paymentNetDays }) as Organisation;

describe('due dates', () => {
  it('counts the printer’s own net days, else the days its terms name, in calendar days', () => {
    // 2026-12-05 + 30 days = 2027-01-04 (26 days left in December, then 4 in January).
    expect(dueDateFor(printer('Net 30', null), '2026-12-05')).toBe('2027-01-04');
    expect(dueDateFor(printer('Net 30', 45), '2026-12-05')).toBe('2027-01-19');
  });

  it('refuses with a message asking the printer to set its payment days when neither says', () => {
    expect(() => dueDateFor(printer('Net 30 EOM', null), '2026-12-05')).toThrow(
      /Lakeside Print has not set how many days it takes to pay \(its terms read "Net 30 EOM"\)/,
    );
    expect(() => dueDateFor(printer(null, null), '2026-12-05')).toThrow(
      /set their days to pay, or terms in days such as "Net 30"/,
    );
  });
});
