import { DielineError } from '../errors';

// A reader of PDF content streams (ISO 32000-1, 7.8.2 "Content streams" and 7.3 "Objects"):
// operands, then the operator they belong to. pdf.js's operator list would do the walking, but
// it turns every colour into RGB and so loses the separation names that say cut or crease.

/** A PDF name operand, e.g. /CS0 or /OC. */
export class PdfName {
  constructor(readonly name: string) {}
}

export type Operand = number | boolean | null | string | PdfName | Operand[] | Map<string, Operand>;

export interface Operation {
  op: string;
  operands: Operand[];
}

const enum Ch {
  Percent = 0x25,
  LParen = 0x28,
  RParen = 0x29,
  Slash = 0x2f,
  Less = 0x3c,
  Greater = 0x3e,
  LBracket = 0x5b,
  Backslash = 0x5c,
  RBracket = 0x5d,
  LBrace = 0x7b,
  RBrace = 0x7d,
}

const WHITE = new Uint8Array(256);
for (const c of [0, 9, 10, 12, 13, 32]) WHITE[c] = 1;
const DELIM = new Uint8Array(256);
for (const c of '()<>[]{}/%') DELIM[c.charCodeAt(0)] = 1;

const LATIN1 = new TextDecoder('latin1');

/** Arrays and dictionaries nested deeper than this are refused (a real page needs two or three). */
const MAX_NESTING = 64;

const malformed = (why: string) =>
  new DielineError('MALFORMED', `The PDF page's drawing instructions could not be read: ${why}.`);

/** Reads one content stream, operation by operation. */
export class ContentLexer {
  private pos = 0;

  constructor(private readonly bytes: Uint8Array) {}

  /** The next operation, or null at the end of the stream. Operands left over at the end are dropped. */
  next(): Operation | null {
    const operands: Operand[] = [];
    for (;;) {
      this.skipSpace();
      if (this.pos >= this.bytes.length) return null;
      const c = this.bytes[this.pos]!;
      if (isRegular(c) && !startsNumber(c)) {
        const word = this.regular();
        if (word === 'true' || word === 'false') operands.push(word === 'true');
        else if (word === 'null') operands.push(null);
        else {
          if (word === 'ID') this.skipInlineImage();
          return { op: word, operands };
        }
      } else {
        operands.push(this.operand(0));
      }
    }
  }

  private operand(depth: number): Operand {
    if (depth > MAX_NESTING) throw malformed('arrays or dictionaries are nested too deep');
    this.skipSpace();
    const b = this.bytes;
    const c = b[this.pos];
    if (c === undefined) throw malformed('it ends in the middle of a value');
    if (c === Ch.Slash) {
      this.pos++;
      return new PdfName(decodeName(this.regular()));
    }
    if (c === Ch.LParen) return this.literalString();
    if (c === Ch.Less) {
      if (b[this.pos + 1] === Ch.Less) return this.dictionary(depth);
      return this.hexString();
    }
    if (c === Ch.LBracket) {
      this.pos++;
      const items: Operand[] = [];
      for (;;) {
        this.skipSpace();
        if (this.pos >= b.length) throw malformed('an array is not closed');
        if (b[this.pos] === Ch.RBracket) {
          this.pos++;
          return items;
        }
        items.push(this.operand(depth + 1));
      }
    }
    if (startsNumber(c)) {
      const word = this.regular();
      const n = Number(word);
      // Readers take a malformed number such as "1.2.3" or "--5" as 0 (common practice).
      return Number.isFinite(n) ? n : 0;
    }
    if (c === Ch.LBrace || c === Ch.RBrace || c === Ch.RBracket || c === Ch.Greater || c === Ch.RParen) {
      this.pos++;
      return null; // a stray delimiter: kept as a placeholder operand
    }
    const word = this.regular();
    if (word === 'true' || word === 'false') return word === 'true';
    if (word === 'null') return null;
    throw malformed(`"${word.slice(0, 20)}" stands where a value belongs`);
  }

  private dictionary(depth: number): Map<string, Operand> {
    this.pos += 2;
    const dict = new Map<string, Operand>();
    for (;;) {
      this.skipSpace();
      const b = this.bytes;
      if (this.pos >= b.length) throw malformed('a dictionary is not closed');
      if (b[this.pos] === Ch.Greater && b[this.pos + 1] === Ch.Greater) {
        this.pos += 2;
        return dict;
      }
      const key = this.operand(depth + 1);
      const value = this.operand(depth + 1);
      if (key instanceof PdfName) dict.set(key.name, value);
    }
  }

  private literalString(): string {
    const b = this.bytes;
    let depth = 0;
    let out = '';
    this.pos++;
    for (; this.pos < b.length; this.pos++) {
      const c = b[this.pos]!;
      if (c === Ch.Backslash) {
        this.pos++;
        const e = b[this.pos];
        if (e === undefined) break;
        const simple: Record<number, string> = { 0x6e: '\n', 0x72: '\r', 0x74: '\t', 0x62: '\b', 0x66: '\f' };
        if (simple[e]) out += simple[e];
        else if (e >= 0x30 && e <= 0x37) {
          let code = e - 0x30;
          for (let k = 0; k < 2 && b[this.pos + 1]! >= 0x30 && b[this.pos + 1]! <= 0x37; k++)
            code = code * 8 + (b[++this.pos]! - 0x30);
          out += String.fromCharCode(code & 0xff);
        } else if (e === 13 || e === 10) {
          if (e === 13 && b[this.pos + 1] === 10) this.pos++; // a line break after \ is dropped
        } else out += String.fromCharCode(e);
        continue;
      }
      if (c === Ch.LParen) depth++;
      if (c === Ch.RParen && depth-- === 0) {
        this.pos++;
        return out;
      }
      out += String.fromCharCode(c);
    }
    throw malformed('a string is not closed');
  }

  private hexString(): string {
    const b = this.bytes;
    const end = b.indexOf(Ch.Greater, this.pos);
    if (end < 0) throw malformed('a hex string is not closed');
    const hex = LATIN1.decode(b.subarray(this.pos + 1, end)).replace(/[^0-9a-fA-F]/g, '');
    this.pos = end + 1;
    let out = '';
    for (let i = 0; i < hex.length; i += 2)
      out += String.fromCharCode(Number.parseInt(hex.slice(i, i + 2).padEnd(2, '0'), 16));
    return out;
  }

  private regular(): string {
    const b = this.bytes;
    const start = this.pos;
    while (this.pos < b.length && isRegular(b[this.pos]!)) this.pos++;
    return LATIN1.decode(b.subarray(start, this.pos));
  }

  private skipSpace(): void {
    const b = this.bytes;
    while (this.pos < b.length) {
      const c = b[this.pos]!;
      if (WHITE[c]) this.pos++;
      else if (c === Ch.Percent) {
        while (this.pos < b.length && b[this.pos] !== 10 && b[this.pos] !== 13) this.pos++;
      } else break;
    }
  }

  /**
   * An inline image's data runs from one white-space byte after ID to "EI" standing alone; its
   * bytes are not read (images are not rules), only stepped over.
   */
  private skipInlineImage(): void {
    const b = this.bytes;
    this.pos++;
    for (let i = this.pos; i + 1 < b.length; i++) {
      if (b[i] === 0x45 && b[i + 1] === 0x49 && WHITE[b[i - 1]!] && (i + 2 >= b.length || !isRegular(b[i + 2]!))) {
        this.pos = i;
        return;
      }
    }
    throw malformed('an inline image has no end (EI)');
  }
}

function isRegular(c: number): boolean {
  return !WHITE[c] && !DELIM[c];
}

function startsNumber(c: number): boolean {
  return (c >= 0x30 && c <= 0x39) || c === 0x2b || c === 0x2d || c === 0x2e;
}

/** #xx escapes in a name (ISO 32000-1, 7.3.5). */
function decodeName(raw: string): string {
  return raw.includes('#')
    ? raw.replace(/#([0-9a-fA-F]{2})/g, (_, h: string) => String.fromCharCode(Number.parseInt(h, 16)))
    : raw;
}
