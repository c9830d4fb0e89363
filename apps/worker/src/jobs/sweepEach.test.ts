import { describe, expect, it } from 'vitest';
import { sweepEach } from './sweepEach';

describe('sweepEach', () => {
  it('goes on past an item that throws, and logs and counts it', async () => {
    const warnings: object[] = [];
    const swept = await sweepEach(
      'test',
      [1, 2, 3],
      async (n) => {
        if (n === 1) throw new Error('bad item');
        return n * 10;
      },
      { warn: (details) => warnings.push(details) },
    );
    expect(swept).toEqual({ results: [20, 30], failed: 1 });
    expect(warnings[0]).toMatchObject({ sweep: 'test', item: 1, err: 'bad item' });
  });
});
