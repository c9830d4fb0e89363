import type { FontFace } from './fontFaces';

export interface FontRun {
  face: FontFace;
  text: string;
}

// Combining marks, joiners and variation selectors belong to the character before them, and a
// line break to the line it ends: none of them starts a run in another font.
const ATTACHED = /^[\p{M}\p{Cf}\n]$/u;

/**
 * Splits text into runs of one font each: every character goes to the first of `faces` that has
 * a glyph for it, but stays in the current run's font while that font has one, so that a word is
 * not split at a space, a digit or a comma. A character no font has goes to the first font,
 * which prints its missing-glyph box rather than losing the rest of the text.
 */
export function fontRuns(text: string, faces: readonly FontFace[]): FontRun[] {
  const runs: FontRun[] = [];
  for (const char of text) {
    const last = runs.at(-1);
    const codePoint = char.codePointAt(0)!;
    const face =
      last && (ATTACHED.test(char) || last.face.has(codePoint))
        ? last.face
        : (faces.find((f) => f.has(codePoint)) ?? faces[0]!);
    if (last?.face === face) last.text += char;
    else runs.push({ face, text: char });
  }
  return runs;
}
