import path from 'node:path';

/**
 * A file name fit to show and to put in a storage key: no folders (so no path traversal), no
 * control or reserved characters, at most 120 characters, and never empty.
 */
export function safeFileName(original: string): string {
  const base = path.posix.basename(original.replace(/\\/g, '/'));
  const cleaned = base
    .normalize('NFC')
    // eslint-disable-next-line no-control-regex -- control characters are exactly what must go
    .replace(/[\u0000-\u001f\u007f<>:"/\\|?*]/g, '_')
    .replace(/^\.+/, '')
    .trim()
    .slice(-120);
  return cleaned || 'dieline';
}
