import { afterEach, describe, expect, it } from 'vitest';
import { mountWithApp, settle } from '../test/mountWithApp';
import DielineViewer from './DielineViewer.vue';

// A 4 × 2 in rectangle of cutting rule; with the 1 in margin the frame is 6 × 4 in from (−1, −1).
const preview = {
  width: 4,
  height: 2,
  paths: [{ d: 'M0 0H4V2H0Z', ruleType: 'cut' as const, layer: 'CUT' }],
};
const viewBox = (w: ReturnType<typeof mountWithApp>) =>
  w.find('[data-test=dieline-svg]').attributes('viewBox')!.split(' ').map(Number);

afterEach(() => {
  document.body.innerHTML = '';
});

describe('DielineViewer by keyboard', () => {
  it('pans a tenth of the view with the arrow keys, zooms with + and −, and fits with 0', async () => {
    const w = mountWithApp(DielineViewer, { preview });
    const svg = w.find('[data-test=dieline-svg]');
    expect(svg.attributes('tabindex')).toBe('0');
    expect(viewBox(w)).toEqual([-1, -1, 6, 4]);
    await svg.trigger('keydown', { key: 'ArrowRight' });
    await settle();
    expect(viewBox(w)[0]).toBeCloseTo(-0.4, 10); // −1 + 0.1 × 6
    await svg.trigger('keydown', { key: 'ArrowDown' });
    await settle();
    expect(viewBox(w)[1]).toBeCloseTo(-0.6, 10); // −1 + 0.1 × 4
    await svg.trigger('keydown', { key: '+' });
    await settle();
    expect(viewBox(w)[2]).toBeCloseTo(6 / 1.4, 10);
    await svg.trigger('keydown', { key: '-' });
    await svg.trigger('keydown', { key: '-' });
    await settle();
    expect(viewBox(w)[2]).toBeCloseTo(6 * 1.4, 10);
    await svg.trigger('keydown', { key: '0' });
    await settle();
    expect(viewBox(w)).toEqual([-1, -1, 6, 4]);
  });

  it('says which rule types are shown on the legend’s toggles', async () => {
    const w = mountWithApp(DielineViewer, { preview });
    const toggle = w.find('[data-test=legend] button');
    expect(toggle.attributes('aria-pressed')).toBe('true');
    await toggle.trigger('click');
    await settle();
    expect(toggle.attributes('aria-pressed')).toBe('false');
  });
});
