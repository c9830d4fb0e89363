import { createHash, randomBytes } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { createStorage, storageConfigFromEnv } from './index';

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

describe('storage on the S3 fake', () => {
  const storage = createStorage(storageConfigFromEnv());

  it('stores a file byte for byte (SHA-256 before and after the round trip)', async () => {
    // 1,120,000 bytes: large enough to be sent in more than one chunk.
    const body = new Uint8Array(randomBytes(1_120_000));
    const key = `test/${Date.now()}-roundtrip.bin`;
    await storage.put(key, body, 'application/octet-stream');
    const back = await storage.get(key);
    expect(back.byteLength).toBe(body.byteLength);
    expect(sha256(back)).toBe(sha256(body));
    await storage.remove(key);
    await expect(storage.get(key)).rejects.toThrow();
  });

  it('gives a presigned link that downloads the file and then expires', async () => {
    const key = `test/${Date.now()}-link.dxf`;
    await storage.put(key, new TextEncoder().encode('0\nEOF\n'), 'application/dxf');
    // Signing times are whole seconds (AWS Signature Version 4's X-Amz-Date), so a 1 s link can be
    // stale at once on a busy machine: 3 s of life, then a wait past it.
    const url = await storage.downloadUrl(key, 'carton front.dxf', 3);
    const res = await fetch(url);
    expect(res.status).toBe(200);
    expect(await res.text()).toBe('0\nEOF\n');
    expect(res.headers.get('content-disposition')).toContain('carton%20front.dxf');
    await new Promise((r) => setTimeout(r, 4100));
    expect((await fetch(url)).status).toBe(403);
  });
});
