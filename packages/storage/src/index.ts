// File storage on S3 (s3rver locally), shared by the API and the worker.
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';

export interface StorageConfig {
  endpoint?: string;
  bucket: string;
  region: string;
  accessKeyId?: string;
  secretAccessKey?: string;
}

export function storageConfigFromEnv(env: NodeJS.ProcessEnv = process.env): StorageConfig {
  return {
    endpoint: env.S3_ENDPOINT || undefined,
    bucket: env.S3_BUCKET ?? 'kerfmark-files',
    region: env.S3_REGION ?? 'us-east-1',
    accessKeyId: env.S3_ACCESS_KEY_ID,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY,
  };
}

export interface Storage {
  put(key: string, body: Uint8Array, contentType: string): Promise<void>;
  get(key: string): Promise<Uint8Array>;
  remove(key: string): Promise<void>;
  /** A short-lived link to download one object, named for the person saving it. */
  downloadUrl(key: string, fileName: string, expiresInSeconds?: number): Promise<string>;
  ping(): Promise<void>;
}

export function createStorage(config: StorageConfig): Storage {
  const client = new S3Client({
    region: config.region,
    endpoint: config.endpoint,
    forcePathStyle: Boolean(config.endpoint),
    credentials:
      config.accessKeyId && config.secretAccessKey
        ? { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey }
        : undefined,
    // With the SDK's default checksums a body is stored with its aws-chunked framing on some
    // S3-compatible servers (silent corruption); only checksum where the service requires it.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 2,
  });
  const Bucket = config.bucket;

  return {
    async put(key, body, contentType) {
      await client.send(
        new PutObjectCommand({
          Bucket,
          Key: key,
          Body: body,
          ContentType: contentType,
          ContentLength: body.byteLength,
        }),
      );
    },
    async get(key) {
      const result = await client.send(new GetObjectCommand({ Bucket, Key: key }));
      if (!result.Body) throw new Error(`empty object ${key}`);
      return result.Body.transformToByteArray();
    },
    async remove(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async downloadUrl(key, fileName, expiresInSeconds = 60) {
      const disposition = `attachment; filename*=UTF-8''${encodeURIComponent(fileName)}`;
      return getSignedUrl(client, new GetObjectCommand({ Bucket, Key: key, ResponseContentDisposition: disposition }), {
        expiresIn: expiresInSeconds,
      });
    },
    async ping() {
      await client.send(new HeadBucketCommand({ Bucket }));
    },
  };
}
