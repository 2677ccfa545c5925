// s3rver ships no types; the few members the tests use (its README: new S3rver(options).run(), .close()).
declare module 's3rver' {
  type Options = { port?: number; address?: string; silent?: boolean; directory: string; configureBuckets?: { name: string }[] };
  export default class S3rver {
    constructor(options: Options);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
