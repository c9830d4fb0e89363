import { DielineError } from './errors';

export const FORMATS = ['dxf', 'svg', 'pdf'] as const;
export type DielineFormat = (typeof FORMATS)[number];

const MAGIC: ReadonlyArray<readonly [number[], string]> = [
  [[0x89, 0x50, 0x4e, 0x47], 'a PNG image'],
  [[0xff, 0xd8, 0xff], 'a JPEG image'],
  [[0x47, 0x49, 0x46, 0x38], 'a GIF image'],
  [[0x50, 0x4b, 0x03, 0x04], 'a ZIP archive (or an Office document)'],
  [[0x1f, 0x8b], 'a gzip-compressed file (an .svgz needs unpacking to .svg first)'],
  [[0x41, 0x43, 0x31, 0x30], 'a DWG drawing (save it as DXF)'],
];

/**
 * Turns the input into text, refusing what cannot be a dieline: too large, empty, binary
 * (images, archives, DWG, binary DXF). UTF-8 is tried first; DXF files written in a Windows
 * code page fall back to Latin-1.
 */
export function decodeInput(content: string | Uint8Array, maxBytes: number): string {
  const size = content.length;
  if (size > maxBytes) {
    throw new DielineError(
      'TOO_LARGE',
      `The file is ${(size / 1048576).toFixed(1)} MB; the most accepted is ${(maxBytes / 1048576).toFixed(0)} MB. Simplify the drawing or split it.`,
    );
  }
  let text: string;
  if (typeof content === 'string') {
    text = content;
  } else {
    for (const [bytes, what] of MAGIC) {
      if (bytes.every((b, i) => content[i] === b))
        throw new DielineError('BINARY', `The file is ${what}, not a DXF, SVG or PDF dieline.`);
    }
    if (startsWith(content, 'AutoCAD Binary DXF')) {
      throw new DielineError('BINARY', 'The file is a binary DXF; save it as an ASCII DXF and try again.');
    }
    if (startsWith(content, '%PDF-')) return '%PDF-';
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(content);
    } catch {
      text = new TextDecoder('latin1').decode(content);
    }
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  if (text.trim() === '') throw new DielineError('EMPTY', 'The file is empty.');
  if (text.startsWith('%PDF-')) return text;
  if (looksBinary(text)) {
    throw new DielineError('BINARY', 'The file holds binary data, not the text of a DXF or SVG dieline.');
  }
  return text;
}

function startsWith(bytes: Uint8Array, ascii: string): boolean {
  for (let i = 0; i < ascii.length; i++) if (bytes[i] !== ascii.charCodeAt(i)) return false;
  return true;
}

/** NUL characters, or many control characters, in the first 64 KB. */
function looksBinary(text: string): boolean {
  const n = Math.min(text.length, 65536);
  let control = 0;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === 0) return true;
    if (c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) control++;
  }
  return control > n * 0.01;
}

/** The format by content; the file name only words the error when the content says nothing. */
export function detectFormat(text: string, fileName?: string): DielineFormat {
  const head = text.slice(0, 4096).trimStart();
  if (head.startsWith('%PDF-')) return 'pdf';
  if (head.startsWith('<')) {
    if (/<(svg:)?svg[\s>/]/i.test(text.slice(0, 65536))) return 'svg';
    throw new DielineError('UNKNOWN_FORMAT', 'The file is XML or HTML but holds no <svg> element.');
  }
  // DXF: pairs of lines, a group code then a value, starting with 0/SECTION or a 999 comment.
  if (/^(0|999)[ \t]*\r?\n/.test(head)) return 'dxf';
  const ext = fileName?.toLowerCase().match(/\.([a-z0-9]+)$/)?.[1];
  if (ext === 'dxf' || ext === 'svg' || ext === 'pdf') {
    throw new DielineError('MALFORMED', `The file is named .${ext} but its content is not ${ext.toUpperCase()}.`);
  }
  throw new DielineError('UNKNOWN_FORMAT', 'The file is not a DXF, SVG or PDF dieline.');
}
