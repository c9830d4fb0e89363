// The local S3 fake (s3rver) on loopback, its files under the profile's data folder.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import S3rver from 's3rver';

const port = Number(new URL(process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4110').port);
const directory = path.join(process.env.DATA_DIR ?? '.data/dev', 's3');
const bucket = process.env.S3_BUCKET ?? 'kerfmark-files';
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  address: '127.0.0.1',
  port,
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [] }],
});
await server.run();
console.log(`S3 fake on http://127.0.0.1:${port}, bucket ${bucket}, files in ${directory}`);

const stop = () => void server.close().finally(() => process.exit(0));
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
