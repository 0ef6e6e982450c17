import { mkdir } from "node:fs/promises";
import S3rver from "s3rver";
import type { RunningService } from "./fake-smtp";

/**
 * Local stand-in for S3: s3rver on 127.0.0.1 storing objects as files under `directory`, so
 * uploaded PDFs survive a restart. The bucket is created at start; it checks the SDK's
 * signatures, so wrong keys fail here as they would in production.
 */
export type FakeS3Options = { host: string; port: number; directory: string; bucket: string };

export async function startFakeS3(options: FakeS3Options): Promise<RunningService> {
  await mkdir(options.directory, { recursive: true });
  const server = new S3rver({
    address: options.host,
    port: options.port,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket, configs: [] }],
  });
  await server.run();
  return { close: () => server.close() };
}
