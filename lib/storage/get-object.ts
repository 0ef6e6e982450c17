import { GetObjectCommand, NoSuchKey } from "@aws-sdk/client-s3";
import { bucket, s3 } from "./s3-client";

export type StoredObject = { body: Buffer; contentType: string | undefined };

/** Reads one object whole (our objects are PDFs and DOCX files); null when the key does not exist. */
export async function getObject(key: string): Promise<StoredObject | null> {
  try {
    const out = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    if (!out.Body) return { body: Buffer.alloc(0), contentType: out.ContentType };
    return { body: Buffer.from(await out.Body.transformToByteArray()), contentType: out.ContentType };
  } catch (error: unknown) {
    if (error instanceof NoSuchKey) return null;
    throw error;
  }
}
