import { readability } from '@ctrl/tinycolor';
import { describe, expect, it } from 'vitest';
import { palette, tagTextColours } from './theme';

describe('theme', () => {
  // tinycolor's readability against worked values: black on white is 21:1 (WCAG 2.1's definition);
  // #767676 on white is 4.54:1, the lightest grey that passes AA on white (from memory).
  it('measures contrast as WCAG does', () => {
    expect(readability('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(readability('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });

  it('draws every preset tag and the muted text at 4.5:1 or more', () => {
    expect(Object.keys(tagTextColours)).toEqual(expect.arrayContaining(['pink-7', 'gold-7', 'cyan-7']));
    expect(tagTextColours['green-7']).not.toBe('#389e0d'); // ant-design's own, 3.4:1 on green-1
    expect(readability(palette.muted, '#ffffff')).toBeGreaterThanOrEqual(4.5);
    expect(readability('#667377', '#ffffff')).toBeGreaterThanOrEqual(4.5);
  });
});
