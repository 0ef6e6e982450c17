import { S3Client } from "@aws-sdk/client-s3";
import { env } from "../env";

// One client per process (it pools its HTTP connections).
let client: S3Client | undefined;

export function s3(): S3Client {
  if (client) return client;
  const e = env();
  client = new S3Client({
    endpoint: e.S3_ENDPOINT,
    region: e.S3_REGION,
    forcePathStyle: e.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    // The SDK's default adds CRC checksums with aws-chunked framing; s3rver (and some S3-compatible
    // stores) keep that framing inside the object. Only checksum when an operation requires it.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return client;
}

export function bucket(): string {
  return env().S3_BUCKET;
}
