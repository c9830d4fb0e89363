import dayjs from 'dayjs';
import { describe, expect, it } from 'vitest';
import { emptyRequestForm, toRequestInput } from './useRequestDraft';

describe('request form conversion', () => {
  it('turns caliper points into inches (1 pt = 0.001 in, common practice) and blanks into nulls', () => {
    const input = toRequestInput({
      ...emptyRequestForm(),
      title: 'Tray',
      caliperPt: 18,
      jobReference: '  ',
      needByDate: dayjs('2026-12-18'),
    });
    expect(input.caliperIn).toBe(0.018);
    expect(input.jobReference).toBeNull();
    expect(input.needByDate).toBe('2026-12-18');
  });

  it('sends invited shops only when the request is for invited shops', () => {
    const form = { ...emptyRequestForm(), title: 'Tray', invitedShopIds: [3, 4] };
    expect(toRequestInput(form).invitedShopIds).toEqual([]);
    expect(toRequestInput({ ...form, visibility: 'invited' }).invitedShopIds).toEqual([3, 4]);
  });

  it('sends the layout of a one-up file, and clears it for a whole die', () => {
    const form = { ...emptyRequestForm(), title: 'Sleeve', upsAcross: 3, upsAlong: 4, gutterIn: 0 };
    expect(toRequestInput({ ...form, dielineShows: 'one-up' })).toMatchObject({
      dielineShows: 'one-up',
      upsAcross: 3,
      upsAlong: 4,
      gutterIn: 0,
      pieceGrain: 'either',
    });
    expect(toRequestInput(form)).toMatchObject({ dielineShows: 'whole-die', upsAcross: null, upsAlong: null });
  });
});
