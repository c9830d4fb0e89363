import { describe, expect, it } from 'vitest';
import { containsPattern } from './containsPattern';

describe('containsPattern', () => {
  // PostgreSQL's LIKE: % and _ are wildcards and backslash is the default escape (PostgreSQL manual, "Pattern Matching").
  it('escapes the LIKE wildcards and the escape character', () => {
    expect(containsPattern('50%_off\\')).toBe('%50\\%\\_off\\\\%');
    expect(containsPattern('carton')).toBe('%carton%');
  });
});
