// The s3rver package ships no types; this covers the part scripts/fake-s3.ts uses.
declare module "s3rver" {
  type S3rverOptions = {
    address?: string;
    port?: number;
    silent?: boolean;
    directory?: string;
    resetOnClose?: boolean;
    allowMismatchedSignatures?: boolean;
    vhostBuckets?: boolean;
    configureBuckets?: Array<{ name: string; configs: Array<string | Buffer> }>;
  };
  export default class S3rver {
    constructor(options?: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
