import { HeadBucketCommand, NotFound } from "@aws-sdk/client-s3";
import { bucket, s3 } from "./s3-client";

export type StorageStatus = { ok: boolean; bucket: string; message: string };

/** Is the bucket reachable with our credentials? For health checks: never throws. */
export async function checkStorage(): Promise<StorageStatus> {
  const name = bucket();
  try {
    await s3().send(new HeadBucketCommand({ Bucket: name }));
    return { ok: true, bucket: name, message: "bucket reachable" };
  } catch (error: unknown) {
    // HEAD answers carry no body: the SDK can only say "UnknownError", so name the cause ourselves.
    if (error instanceof NotFound) return { ok: false, bucket: name, message: `bucket ${name} does not exist` };
    const message = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
    return { ok: false, bucket: name, message };
  }
}
