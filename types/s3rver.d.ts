/** The parts of s3rver (3.7.1, no types of its own) that the fake S3 server uses. */
declare module "s3rver" {
  import type { AddressInfo } from "node:net";
  export default class S3rver {
    constructor(options: {
      address?: string;
      port?: number;
      silent?: boolean;
      directory?: string;
      configureBuckets?: { name: string }[];
      allowMismatchedSignatures?: boolean;
      vhostBuckets?: boolean;
    });
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
