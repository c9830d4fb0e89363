import { describe, expect, it } from 'vitest';
import { DielineError } from './errors';
import { decodeInput, detectFormat } from './input';

const code = (fn: () => unknown) => {
  try {
    fn();
  } catch (e) {
    if (e instanceof DielineError) return `${e.code}: ${e.message}`;
    throw e;
  }
  return 'no error';
};

describe('decodeInput', () => {
  it('refuses empty and blank files', () => {
    expect(code(() => decodeInput('', 100))).toMatch(/^EMPTY: The file is empty/);
    expect(code(() => decodeInput(new Uint8Array([32, 10, 13, 9]), 100))).toMatch(/^EMPTY/);
  });

  it('refuses files over the size limit, saying the limit', () => {
    expect(code(() => decodeInput(new Uint8Array(3 * 1048576), 2 * 1048576))).toMatch(
      /^TOO_LARGE: The file is 3\.0 MB; the most accepted is 2 MB/,
    );
  });

  it('names images, archives and DWG files', () => {
    expect(code(() => decodeInput(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 13, 10]), 100))).toMatch(
      /^BINARY: .*PNG image/,
    );
    expect(code(() => decodeInput(new Uint8Array([0x50, 0x4b, 3, 4, 0]), 100))).toMatch(/ZIP/);
    expect(code(() => decodeInput(new TextEncoder().encode('AC1027\0\0'), 100))).toMatch(/DWG/);
    expect(code(() => decodeInput(new TextEncoder().encode('AutoCAD Binary DXF\r\n\x1a\0'), 100))).toMatch(
      /binary DXF/,
    );
  });

  it('refuses other binary data', () => {
    const junk = new Uint8Array(1000).map((_, i) => (i * 7919) % 256);
    expect(code(() => decodeInput(junk, 10_000))).toMatch(/^BINARY/);
    expect(code(() => decodeInput('0\nSECTION\n\0\0', 100))).toMatch(/^BINARY/);
  });

  it('reads UTF-8, drops a byte-order mark, and falls back to Latin-1', () => {
    expect(decodeInput(new Uint8Array([0xef, 0xbb, 0xbf, 0x3c, 0x73]), 100)).toBe('<s');
    // 0xC9 alone is not UTF-8; in Latin-1 it is É.
    expect(decodeInput(new Uint8Array([0x30, 0x0a, 0xc9]), 100)).toBe('0\nÉ');
  });
});

describe('detectFormat', () => {
  it('goes by content, not by the name', () => {
    expect(detectFormat('0\nSECTION\n', 'drawing.svg')).toBe('dxf');
    expect(detectFormat('999\ncomment\n0\nSECTION\n')).toBe('dxf');
    expect(detectFormat('<?xml version="1.0"?>\n<svg xmlns="x"/>', 'a.dxf')).toBe('svg');
    expect(detectFormat('%PDF-1.7\n')).toBe('pdf');
  });

  it('says what it could not recognise', () => {
    expect(code(() => detectFormat('<html><body/></html>'))).toMatch(/^UNKNOWN_FORMAT: .*no <svg>/);
    expect(code(() => detectFormat('hello', 'box.dxf'))).toMatch(
      /^MALFORMED: The file is named \.dxf but its content is not DXF/,
    );
    expect(code(() => detectFormat('hello'))).toMatch(/^UNKNOWN_FORMAT/);
  });
});
