// The package ships no types; only what server/photos/store-stand-in.ts uses.
declare module "s3rver" {
  import type { AddressInfo } from "node:net";
  export default class S3rver {
    constructor(options: {
      address?: string;
      port?: number;
      directory: string;
      silent?: boolean;
      configureBuckets?: { name: string; configs: (string | Buffer)[] }[];
    });
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
