import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { create, type Font } from 'fontkit';

export type FontWeight = 'regular' | 'bold';

/** One font file of a chain, read and parsed the first time a character asks for it. */
export interface FontFace {
  /** The name the PDF registers it under. */
  readonly name: string;
  has(codePoint: number): boolean;
  bytes(): Buffer;
}

// The Noto Sans families (SIL Open Font License), as whole TTF files, tried in this order for each
// character: Noto Sans for Latin, Greek, Cyrillic, Vietnamese and Devanagari; then Japanese,
// Simplified Chinese and Korean, Japanese first so that the Han characters the three share take
// Japanese glyph forms; then Thai. Each file is read only when a text needs it, and pdfkit embeds
// only the glyphs a document uses.
const FAMILIES = ['NotoSans', 'NotoSansJP', 'NotoSansSC', 'NotoSansKR', 'NotoSansThai'];
const PACKAGES: Record<string, string> = {
  NotoSans: 'noto-sans',
  NotoSansJP: 'noto-sans-jp',
  NotoSansSC: 'noto-sans-sc',
  NotoSansKR: 'noto-sans-kr',
  NotoSansThai: 'noto-sans-thai',
};
const STYLES: Record<FontWeight, string> = { regular: '400Regular', bold: '700Bold' };

const resolve = createRequire(import.meta.url).resolve;

function lazyFace(family: string, weight: FontWeight): FontFace {
  const style = STYLES[weight];
  const path = resolve(`@expo-google-fonts/${PACKAGES[family]}/${style}/${family}_${style}.ttf`);
  let loaded: { bytes: Buffer; font: Font } | undefined;
  const load = () => {
    if (!loaded) {
      const bytes = readFileSync(path);
      loaded = { bytes, font: create(bytes) as Font };
    }
    return loaded;
  };
  return {
    name: `${family}-${style}`,
    has: (codePoint) => load().font.hasGlyphForCodePoint(codePoint),
    bytes: () => load().bytes,
  };
}

// One chain per weight for the whole process: a font is parsed once, however many documents use it.
const chains: Record<FontWeight, readonly FontFace[]> = {
  regular: FAMILIES.map((family) => lazyFace(family, 'regular')),
  bold: FAMILIES.map((family) => lazyFace(family, 'bold')),
};

/** The fonts a document's text is printed in, of one weight, in the order they are tried. */
export function fontFaces(weight: FontWeight): readonly FontFace[] {
  return chains[weight];
}
