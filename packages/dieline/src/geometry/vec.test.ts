import { describe, expect, it } from 'vitest';
import { hypot } from './vec';

describe('hypot', () => {
  // The reference is the engine's own Math.hypot: the same bits for every pair, so lengths and
  // distances measured with it do not move.
  it('gives exactly what Math.hypot gives', () => {
    const special = [
      0,
      -0,
      1,
      -1,
      3,
      4,
      0.1,
      1e-300,
      1e300,
      Number.MIN_VALUE,
      Number.MAX_VALUE,
      Infinity,
      -Infinity,
      NaN,
    ];
    for (const x of special) for (const y of special) expect(Object.is(hypot(x, y), Math.hypot(x, y))).toBe(true);
    const bits = new Float64Array(2);
    const words = new Uint32Array(bits.buffer);
    let seed = 1;
    const next = () => {
      seed ^= seed << 13;
      seed ^= seed >>> 17;
      seed ^= seed << 5;
      return seed >>> 0;
    };
    let differ = 0;
    for (let i = 0; i < 200_000; i++) {
      let x: number;
      let y: number;
      if (i % 2 === 0) {
        x = (next() / 2 ** 32 - 0.5) * 10 ** ((next() % 12) - 6);
        y = (next() / 2 ** 32 - 0.5) * 10 ** ((next() % 12) - 6);
      } else {
        for (let w = 0; w < 4; w++) words[w] = next();
        [x, y] = [bits[0]!, bits[1]!];
      }
      if (!Object.is(hypot(x, y), Math.hypot(x, y))) differ++;
    }
    expect(differ).toBe(0);
  });
});
