import { mkdir } from "node:fs/promises";
import type { AddressInfo } from "node:net";
import S3rver from "s3rver";

/**
 * A local S3 service (s3rver) on 127.0.0.1 with its own folder, so uploads go through the real
 * S3 protocol without leaving the machine. `npm start`, the browser tests and the API tests each
 * run one, with different folders and ports.
 */
export interface S3Fake {
  port: number;
  endpoint: string;
  bucket: string;
  /** Empties the bucket (tests call this between cases). */
  reset(): Promise<void>;
  stop(): Promise<void>;
}

export async function startS3Fake(options: { port: number; directory: string; bucket: string }): Promise<S3Fake> {
  await mkdir(options.directory, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port: options.port,
    directory: options.directory,
    silent: true,
    // Path-style only: no DNS tricks for bucket subdomains on loopback.
    vhostBuckets: false,
    configureBuckets: [{ name: options.bucket }],
  });
  const address: AddressInfo = await server.run();
  return {
    port: address.port,
    endpoint: `http://127.0.0.1:${address.port}`,
    bucket: options.bucket,
    async reset() {
      server.reset();
      await server.configureBuckets();
    },
    async stop() {
      await server.close();
    },
  };
}
