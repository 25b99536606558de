// The fake S3 server ships no types; this is the part of its API the stack uses.
declare module "s3rver" {
  interface S3rverOptions {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    configureBuckets?: { name: string; configs: (string | Buffer)[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<unknown>;
    close(): Promise<void>;
  }
}
