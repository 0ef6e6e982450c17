import type { Readable } from "node:stream";
import { PutObjectCommand } from "@aws-sdk/client-s3";
import { bucket, s3 } from "./s3-client";

export type PutObjectInput = {
  key: string;
  body: Buffer | Uint8Array | string | Readable;
  contentType: string;
  /** Needed with a stream body on real S3, which refuses uploads of unknown length. */
  contentLength?: number;
};

/** Stores one object in the app's bucket, replacing any object with the same key. */
export async function putObject(input: PutObjectInput): Promise<void> {
  await s3().send(
    new PutObjectCommand({
      Bucket: bucket(),
      Key: input.key,
      Body: input.body,
      ContentType: input.contentType,
      ContentLength: input.contentLength,
    }),
  );
}
