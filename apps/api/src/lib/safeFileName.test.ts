import { describe, expect, it } from 'vitest';
import { safeFileName } from './safeFileName';

describe('safeFileName', () => {
  it('drops folders, so no name can climb out of its place', () => {
    expect(safeFileName('../../etc/passwd')).toBe('passwd');
    expect(safeFileName('..\\..\\windows\\win.ini')).toBe('win.ini');
    expect(safeFileName('/abs/path/carton.dxf')).toBe('carton.dxf');
  });

  it('replaces control and reserved characters and hidden-file dots', () => {
    expect(safeFileName('tray<1>:"a|b"?.svg')).toBe('tray_1___a_b__.svg');
    expect(safeFileName('..hidden.dxf')).toBe('hidden.dxf');
    expect(safeFileName('line\nbreak.dxf')).toBe('line_break.dxf');
  });

  it('never answers an empty name', () => {
    expect(safeFileName('')).toBe('dieline');
    expect(safeFileName('...')).toBe('dieline');
  });
});
