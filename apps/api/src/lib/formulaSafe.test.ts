import { describe, expect, it } from 'vitest';
import { formulaSafe } from './formulaSafe';

// The characters that start a formula, from OWASP's "CSV Injection" page.
describe('formulaSafe', () => {
  it.each([
    ['=HYPERLINK("http://evil.example","x")', `'=HYPERLINK("http://evil.example","x")`],
    ['+1+cmd', `'+1+cmd`],
    ['-2+3', `'-2+3`],
    ['@SUM(A1:A2)', `'@SUM(A1:A2)`],
    ['\t=1', `'\t=1`],
    ['\r=1', `'\r=1`],
  ])('quotes %j', (text, safe) => expect(formulaSafe(text)).toBe(safe));

  it('leaves ordinary text as it is', () => {
    for (const text of ['Brightline Rule & Die', 'Łódź Wykrojniki', 'a=b', '', '3M'])
      expect(formulaSafe(text)).toBe(text);
    expect(formulaSafe(null)).toBe('');
  });
});
