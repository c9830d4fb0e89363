import { describe, expect, it } from 'vitest';
import { fontFaces, type FontFace } from './fontFaces';
import { fontRuns } from './fontRuns';

/** A stand-in font with glyphs for exactly these characters. */
const face = (name: string, chars: string): FontFace => ({
  name,
  has: (codePoint) => [...chars].some((c) => c.codePointAt(0) === codePoint),
  bytes: () => Buffer.alloc(0),
});
const latin = face('latin', 'abcdefghijklmnopqrstuvwxyz ,.-0123456789');
const han = face('han', '東京抜型 ,.-0123456789');
const runsOf = (text: string, faces = [latin, han]) => fontRuns(text, faces).map((r) => [r.face.name, r.text]);

describe('fontRuns', () => {
  it('gives each character the first font that has it', () => {
    expect(runsOf('tokyo東京')).toEqual([
      ['latin', 'tokyo'],
      ['han', '東京'],
    ]);
  });

  it('keeps spaces, digits and commas in the run they fall in, so words are not split', () => {
    expect(runsOf('東京 1-2, abc')).toEqual([
      ['han', '東京 1-2, '],
      ['latin', 'abc'],
    ]);
  });

  it('keeps a combining mark and a line break with the character before them', () => {
    // U+0301 COMBINING ACUTE ACCENT is a mark (Unicode general category Mn), in neither font here.
    expect(runsOf('東\u0301\nab')).toEqual([
      ['han', '東\u0301\n'],
      ['latin', 'ab'],
    ]);
  });

  it('sends a character no font has to the first font, losing none of the text', () => {
    expect(runsOf('ab📦cd')).toEqual([['latin', 'ab📦cd']]);
    expect(runsOf('📦東')).toEqual([
      ['latin', '📦'],
      ['han', '東'],
    ]);
  });

  it('is empty for empty text', () => {
    expect(runsOf('')).toEqual([]);
  });
});

describe('the embedded fonts', () => {
  const names = (text: string) => fontRuns(text, fontFaces('regular')).map((r) => r.face.name);

  // Coverage as the fonts' own character maps give it (read with fontkit): Noto Sans has Latin,
  // Greek and Cyrillic; the Japanese, Chinese and Korean families have their own scripts.
  it('print Polish, Greek and Cyrillic in Noto Sans', () => {
    expect(names('Łódź Kartonaż Sp. z o.o. · Αθήνα · Москва')).toEqual(['NotoSans-400Regular']);
  });

  it('print Japanese in Noto Sans JP, a simplified Chinese character in Noto Sans SC, Hangul in Noto Sans KR', () => {
    expect(names('東京抜型製作所')).toEqual(['NotoSansJP-400Regular']);
    // "纸" (U+7EB8) is a simplified form that Japanese does not use.
    expect(names('纸')).toEqual(['NotoSansSC-400Regular']);
    expect(names('서울')).toEqual(['NotoSansKR-400Regular']);
    expect(names('กรุงเทพ')).toEqual(['NotoSansThai-400Regular']);
  });
});
