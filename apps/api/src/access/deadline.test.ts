import { describe, expect, it } from 'vitest';
import { deadlineMoveRefusal, MIN_DEADLINE_NOTICE_MS } from './deadline';
import { facts, HOUR, NOW, pastDeadline, printer, shop } from './testFacts';

const at = (ms: number) => new Date(NOW.getTime() + ms);
const buyer = printer('buyer');
const purchasing = printer('purchasing');
const admin = printer('admin');

describe('moving an open request’s bid deadline', () => {
  const open = facts('open'); // deadline a week away

  it('later: its buyer or purchasing', () => {
    for (const who of [buyer, purchasing, admin])
      expect(deadlineMoveRefusal(who, open, at(14 * 24 * HOUR), NOW)).toBeNull();
  });

  it('earlier: purchasing only, and never to less than 24 hours from now', () => {
    expect(MIN_DEADLINE_NOTICE_MS).toBe(24 * HOUR);
    expect(deadlineMoveRefusal(buyer, open, at(3 * 24 * HOUR), NOW)?.status).toBe(403);
    expect(deadlineMoveRefusal(purchasing, open, at(3 * 24 * HOUR), NOW)).toBeNull();
    expect(deadlineMoveRefusal(admin, open, at(MIN_DEADLINE_NOTICE_MS), NOW)).toBeNull();
    for (const soon of [5_000, HOUR, MIN_DEADLINE_NOTICE_MS - 1]) {
      expect(deadlineMoveRefusal(purchasing, open, at(soon), NOW)).toMatchObject({ status: 400, field: 'bidDeadline' });
    }
  });

  it('an earlier deadline already inside the notice may still move later, not earlier', () => {
    const soon = facts('open', { bidDeadline: at(2 * HOUR) });
    expect(deadlineMoveRefusal(buyer, soon, at(3 * HOUR), NOW)).toBeNull();
    expect(deadlineMoveRefusal(purchasing, soon, at(HOUR), NOW)?.status).toBe(400);
  });

  it('is never taken away, nor moved once bidding closed', () => {
    expect(deadlineMoveRefusal(purchasing, open, null, NOW)?.status).toBe(400);
    expect(deadlineMoveRefusal(purchasing, pastDeadline('open'), at(7 * 24 * HOUR), NOW)?.status).toBe(409);
  });

  it('is another organisation’s record to everyone else', () => {
    expect(deadlineMoveRefusal(printer('purchasing', 11), open, at(14 * 24 * HOUR), NOW)?.status).toBe(404);
    expect(deadlineMoveRefusal(shop(20), open, at(14 * 24 * HOUR), NOW)?.status).toBe(404);
  });

  it('leaves a draft’s deadline to publishing', () => {
    expect(deadlineMoveRefusal(buyer, facts('draft'), at(HOUR), NOW)).toBeNull();
  });
});
