import { requestStatuses, requestTransitions, type RequestStatus } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import type { AuthUser } from '../auth/passport';
import type { DieRequest } from '../models';
import { allowedActions, checkTransition } from './requestStatus';

const user = (orgKind: 'printer' | 'die_shop', role: AuthUser['role'], organisationId: number): AuthUser => ({
  id: 1, email: 'x@y.example', name: 'X', role, organisationId, orgKind, timeZone: 'UTC', orgPostcode: null, jti: 'j', tokenExpiresAt: new Date(),
});
const request = (status: RequestStatus) => ({ status, organisationId: 10 }) as DieRequest;
const buyer = user('printer', 'buyer', 10);
const purchasing = user('printer', 'purchasing', 10);
const otherPrinter = user('printer', 'purchasing', 11);
const winner = user('die_shop', 'estimator', 20);
const loser = user('die_shop', 'estimator', 21);

describe('request status transitions', () => {
  it('follows the life of a die: draft → open → closed → awarded → production → shipped → received', () => {
    expect(checkTransition(buyer, request('draft'), 'publish', null).to).toBe('open');
    expect(checkTransition(purchasing, request('open'), 'close-bidding', null).to).toBe('bidding_closed');
    expect(checkTransition(purchasing, request('bidding_closed'), 'award', null).to).toBe('awarded');
    expect(checkTransition(winner, request('awarded'), 'start-production', 20).to).toBe('in_production');
    expect(checkTransition(winner, request('in_production'), 'ship', 20).to).toBe('shipped');
    expect(checkTransition(buyer, request('shipped'), 'receive', 20).to).toBe('received');
  });

  it('refuses every move that is not in the table', () => {
    const actions = [...new Set(requestTransitions.map((t) => t.action))];
    for (const status of requestStatuses) {
      for (const action of actions) {
        const listed = requestTransitions.some((t) => t.from === status && t.action === action);
        if (!listed) expect(() => checkTransition(purchasing, request(status), action, 20)).toThrow(/cannot be moved/);
      }
    }
    // Terminal states go nowhere.
    expect(allowedActions(purchasing, 'received', 10, 20)).toEqual([]);
    expect(allowedActions(purchasing, 'cancelled', 10, 20)).toEqual([]);
  });

  it('checks the side and the role', () => {
    expect(() => checkTransition(buyer, request('open'), 'close-bidding', null)).toThrow(/Only purchasing, admin/);
    expect(() => checkTransition(otherPrinter, request('draft'), 'publish', null)).toThrow(/cannot make this change/);
    expect(() => checkTransition(loser, request('awarded'), 'start-production', 20)).toThrow(/cannot make this change/);
    expect(() => checkTransition(purchasing, request('in_production'), 'ship', 20)).toThrow(/cannot make this change/);
  });

  it('lists the buttons each user may press', () => {
    expect(allowedActions(buyer, 'draft', 10, null).sort()).toEqual(['cancel', 'publish']);
    expect(allowedActions(buyer, 'open', 10, null)).toEqual(['cancel']);
    expect(allowedActions(purchasing, 'open', 10, null).sort()).toEqual(['cancel', 'close-bidding']);
    expect(allowedActions(winner, 'awarded', 10, 20)).toEqual(['start-production']);
    expect(allowedActions(loser, 'awarded', 10, 20)).toEqual([]);
  });
});
