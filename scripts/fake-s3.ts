import { mkdir } from "node:fs/promises";
import { createServer } from "node:net";
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
  // s3rver has no listener for its server's 'error' event: a taken port would crash the process
  // with a stack trace instead of an error we can report, so find out first.
  await assertPortFree(options.host, options.port);
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

function assertPortFree(host: string, port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once("error", reject);
    probe.listen(port, host, () => probe.close(() => resolve()));
  });
}
