import { CreateBucketCommand, HeadBucketCommand, NotFound } from "@aws-sdk/client-s3";
import { bucket, s3 } from "./s3-client";

/** Creates the bucket when it does not exist yet; any other error (credentials, network) is thrown. */
export async function ensureBucket(): Promise<void> {
  const name = bucket();
  try {
    await s3().send(new HeadBucketCommand({ Bucket: name }));
  } catch (error: unknown) {
    if (!(error instanceof NotFound)) throw error;
    await s3().send(new CreateBucketCommand({ Bucket: name }));
  }
}
