// s3rver ships no types; this is the part scripts/fakes/s3-server.ts uses.
declare module "s3rver" {
  type Options = { address?: string; port?: number; directory?: string; silent?: boolean; configureBuckets?: Array<{ name: string; configs: Array<string | Buffer> }> };
  export default class S3rver {
    constructor(options: Options);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
