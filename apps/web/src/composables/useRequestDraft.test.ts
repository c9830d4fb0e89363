import dayjs from 'dayjs';
import { describe, expect, it } from 'vitest';
import { emptyRequestForm, toRequestInput } from './useRequestDraft';

describe('request form conversion', () => {
  it('turns caliper points into inches (1 pt = 0.001 in, common practice) and blanks into nulls', () => {
    const input = toRequestInput(
      {
        ...emptyRequestForm(),
        title: 'Tray',
        caliperPt: 18,
        jobReference: '  ',
        needByDate: dayjs('2026-12-18'),
      },
      'America/Chicago',
    );
    expect(input.caliperIn).toBe(0.018);
    expect(input.jobReference).toBeNull();
    expect(input.needByDate).toBe('2026-12-18');
  });

  it('reads the deadline picked as the organisation’s wall clock, whatever the browser’s zone', () => {
    // 17:00 on 10 Dec in Berlin (UTC+1 in winter) is 16:00 UTC; the same picker in Chicago is 23:00 UTC.
    const form = { ...emptyRequestForm(), title: 'Tray', bidDeadline: dayjs('2026-12-10T17:00:00') };
    expect(toRequestInput(form, 'Europe/Berlin').bidDeadline).toBe('2026-12-10T16:00:00.000Z');
    expect(toRequestInput(form, 'America/Chicago').bidDeadline).toBe('2026-12-10T23:00:00.000Z');
  });

  it('sends invited shops only when the request is for invited shops', () => {
    const form = { ...emptyRequestForm(), title: 'Tray', invitedShopIds: [3, 4] };
    expect(toRequestInput(form, 'America/Chicago').invitedShopIds).toEqual([]);
    expect(toRequestInput({ ...form, visibility: 'invited' }, 'America/Chicago').invitedShopIds).toEqual([3, 4]);
  });

  it('sends the layout of a one-up file, and clears it for a whole die', () => {
    const form = { ...emptyRequestForm(), title: 'Sleeve', upsAcross: 3, upsAlong: 4, gutterIn: 0 };
    expect(toRequestInput({ ...form, dielineShows: 'one-up' }, 'America/Chicago')).toMatchObject({
      dielineShows: 'one-up',
      upsAcross: 3,
      upsAlong: 4,
      gutterIn: 0,
      pieceGrain: 'either',
    });
    expect(toRequestInput(form, 'America/Chicago')).toMatchObject({
      dielineShows: 'whole-die',
      upsAcross: null,
      upsAlong: null,
    });
  });
});
