// The standard PDF fonts' WinAnsiEncoding is Windows-1252: the printable ISO 8859-1 characters
// plus these 27 at bytes 0x80–0x9F (WHATWG Encoding, index-windows-1252). Written out because
// Node 20's TextDecoder('windows-1252') decodes those bytes as Latin-1 (nodejs/node#60888).
const WINDOWS_1252_EXTRAS = '€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ';

/**
 * The first character of `text` that the standard PDF fonts (Helvetica and friends) have no
 * glyph for, e.g. "ł" or "東"; pdfkit would print it as garbage. Undefined if there is none.
 * A newline is fine: pdfkit breaks the line there.
 */
export function unprintableCharacter(text: string): string | undefined {
  return [...text].find((c) => {
    const code = c.codePointAt(0) ?? 0;
    const latin1 = (code >= 0x20 && code <= 0x7e) || (code >= 0xa0 && code <= 0xff);
    return !(latin1 || c === '\n' || WINDOWS_1252_EXTRAS.includes(c));
  });
}
