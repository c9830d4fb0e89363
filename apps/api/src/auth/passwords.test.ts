import bcrypt from 'bcryptjs';
import { describe, expect, it } from 'vitest';
import { dummyHash, hashPassword, verifyPassword } from './passwords';
import { testConfig } from '../test/harness';

// A bcrypt hash names its cost: `$2b$NN$` (the modular crypt format of OpenBSD's bcrypt), so equal
// costs mean an unknown e-mail and a wrong password take the same work, without timing anything.
const cost = (hash: string) => bcrypt.getRounds(hash);

describe('passwords', () => {
  it('checks an unknown e-mail against a hash of the same cost as the real ones', async () => {
    const real = await hashPassword('correct horse battery', testConfig.bcryptRounds);
    expect(cost(dummyHash(testConfig.bcryptRounds))).toBe(cost(real));
    expect(cost(dummyHash(12))).toBe(12);
    expect(dummyHash(6)).toMatch(/^\$2[aby]\$06\$/);
  });

  it('accepts the right password and refuses the wrong one and the unknown user', async () => {
    const hash = await hashPassword('correct horse battery', 4);
    expect(await verifyPassword('correct horse battery', hash, 4)).toBe(true);
    expect(await verifyPassword('wrong', hash, 4)).toBe(false);
    expect(await verifyPassword('anything at all', undefined, 4)).toBe(false);
  });
});
