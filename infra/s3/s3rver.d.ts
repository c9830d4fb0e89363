// s3rver ships no types; this is the part we use.
declare module 's3rver' {
  interface S3rverOptions {
    address?: string;
    port?: number;
    directory: string;
    silent?: boolean;
    configureBuckets?: Array<{ name: string; configs: unknown[] }>;
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
