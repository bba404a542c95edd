// s3rver ships no type declarations; this is the part of its API local-s3.ts uses.
declare module "s3rver" {
  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory?: string;
    configureBuckets?: { name: string; configs?: unknown[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
