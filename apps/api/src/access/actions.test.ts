import { requestStatuses, requestTransitions } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { actionRefusal, openActions, transitionRefusal } from './actions';
import { facts, NOW, pastDeadline, printer, shop } from './testFacts';

const buyer = printer('buyer');
const purchasing = printer('purchasing');
const otherPrinter = printer('purchasing', 11);
const winner = shop(20);
const loser = shop(21, 'estimator');
const to = (status: Parameters<typeof facts>[0]) => facts(status, { awardedShopId: 20, bidderShopIds: [20, 21] });

describe('request status transitions', () => {
  it('follows the life of a die: draft → open → closed → awarded → production → shipped → received', () => {
    expect(transitionRefusal(buyer, to('draft'), 'publish').transition?.to).toBe('open');
    expect(transitionRefusal(purchasing, to('open'), 'close-bidding').transition?.to).toBe('bidding_closed');
    expect(transitionRefusal(purchasing, to('bidding_closed'), 'award').transition?.to).toBe('awarded');
    expect(transitionRefusal(winner, to('awarded'), 'start-production').transition?.to).toBe('in_production');
    expect(transitionRefusal(winner, to('in_production'), 'ship').transition?.to).toBe('shipped');
    expect(transitionRefusal(buyer, to('shipped'), 'receive').transition?.to).toBe('received');
  });

  it('refuses every move that is not in the table', () => {
    const actions = [...new Set(requestTransitions.map((t) => t.action))];
    for (const status of requestStatuses) {
      for (const action of actions) {
        const listed = requestTransitions.some((t) => t.from === status && t.action === action);
        if (!listed)
          expect(transitionRefusal(purchasing, to(status), action).refusal?.message).toMatch(/cannot be moved/);
      }
    }
    expect(openActions(purchasing, to('received'), NOW)).toEqual([
      'answer',
      'see-invoice',
      'dispute-invoice',
      'approve-invoice',
      'record-payment',
    ]);
    expect(openActions(purchasing, to('cancelled'), NOW)).toEqual(['answer', 'see-invoice']);
  });

  it('never leads back to bidding once the bids are opened', () => {
    expect(requestTransitions.filter((t) => t.to === 'open').map((t) => t.from)).toEqual(['draft']);
  });

  it('checks the side and the role: another shop’s job is a 404', () => {
    expect(transitionRefusal(buyer, to('open'), 'close-bidding').refusal).toMatchObject({
      status: 403,
      message: /Only purchasing, admin/,
    });
    expect(transitionRefusal(otherPrinter, to('draft'), 'publish').refusal).toMatchObject({ status: 403 });
    expect(transitionRefusal(loser, to('awarded'), 'start-production').refusal).toMatchObject({ status: 404 });
    expect(transitionRefusal(purchasing, to('in_production'), 'ship').refusal).toMatchObject({ status: 403 });
  });
});

describe('the actions open now', () => {
  it('lists the buttons each user may press', () => {
    expect(openActions(buyer, facts('draft'), NOW).sort()).toEqual([
      'answer',
      'cancel',
      'edit',
      'publish',
      'remove-file',
    ]);
    expect(openActions(buyer, facts('open'), NOW).sort()).toEqual(['answer', 'cancel', 'edit', 'move-deadline-later']);
    expect(openActions(purchasing, facts('open'), NOW).sort()).toEqual([
      'answer',
      'cancel',
      'close-bidding',
      'edit',
      'move-deadline-earlier',
      'move-deadline-later',
    ]);
    expect(openActions(winner, to('awarded'), NOW)).toEqual(['start-production', 'see-invoice']);
    expect(openActions(loser, to('awarded'), NOW)).toEqual([]);
  });

  it('a shop bids once, then revises or withdraws, until the deadline', () => {
    expect(openActions(shop(21), facts('open'), NOW).sort()).toEqual(['ask', 'bid', 'decline']);
    expect(openActions(shop(20), facts('open'), NOW).sort()).toEqual(['ask', 'decline', 'revise', 'withdraw']);
    expect(openActions(shop(20), pastDeadline('open'), NOW)).toEqual([]);
    expect(actionRefusal(shop(21), facts('open', { visibility: 'invited' }), 'bid', NOW)?.status).toBe(404);
  });

  it('award: purchasing, once bids are opened by the clock or by closing early; never on a cancelled request', () => {
    expect(actionRefusal(buyer, pastDeadline('open'), 'award', NOW)?.status).toBe(403);
    expect(actionRefusal(purchasing, facts('open'), 'award', NOW)).toMatchObject({
      status: 409,
      message: /still sealed/,
    });
    expect(actionRefusal(purchasing, pastDeadline('open'), 'award', NOW)).toBeNull();
    expect(actionRefusal(purchasing, facts('bidding_closed'), 'award', NOW)).toBeNull();
    expect(actionRefusal(purchasing, facts('cancelled'), 'award', NOW)?.status).toBe(409);
    expect(actionRefusal(purchasing, to('awarded'), 'award', NOW)).toMatchObject({
      status: 409,
      message: /already been awarded/,
    });
  });

  it('edits stop at the deadline: the bids rest on the request as it was', () => {
    expect(actionRefusal(buyer, pastDeadline('open'), 'edit', NOW)?.status).toBe(409);
    expect(actionRefusal(buyer, facts('bidding_closed'), 'edit', NOW)?.status).toBe(409);
    expect(actionRefusal(otherPrinter, facts('draft'), 'edit', NOW)?.status).toBe(404);
    expect(actionRefusal(shop(20), facts('open'), 'edit', NOW)?.status).toBe(403);
    // Files leave a draft only: an open request keeps what shops have seen.
    expect(actionRefusal(buyer, facts('open'), 'remove-file', NOW)?.status).toBe(409);
    expect(actionRefusal(buyer, facts('draft'), 'remove-file', NOW)).toBeNull();
  });
});
