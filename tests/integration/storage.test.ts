import { randomBytes, randomUUID } from "node:crypto";
import { Readable } from "node:stream";
import { describe, expect, it } from "vitest";
import { checkStorage } from "@/lib/storage/check-storage";
import { ensureBucket } from "@/lib/storage/ensure-bucket";
import { getObject } from "@/lib/storage/get-object";
import { putObject } from "@/lib/storage/put-object";

// Runs against the fake S3 (s3rver) that scripts/test.sh starts.
describe("object storage", () => {
  it("reports the bucket reachable", async () => {
    const status = await checkStorage();
    expect(status).toMatchObject({ ok: true, bucket: "panelpoint" });
  });

  it("ensureBucket is harmless when the bucket exists", async () => {
    await expect(ensureBucket()).resolves.toBeUndefined();
  });

  it("returns a small object as stored, with its content type", async () => {
    const key = `test/${randomUUID()}.txt`;
    await putObject({ key, body: "Sheet 1 of 3", contentType: "text/plain" });
    const back = await getObject(key);
    expect(back?.body.toString("utf8")).toBe("Sheet 1 of 3");
    expect(back?.contentType).toBe("text/plain");
  });

  it("returns a 300 KiB buffer byte for byte", async () => {
    const key = `test/${randomUUID()}.pdf`;
    const body = randomBytes(300 * 1024);
    await putObject({ key, body, contentType: "application/pdf" });
    const back = await getObject(key);
    expect(back?.body.length).toBe(body.length);
    expect(back?.body.equals(body)).toBe(true);
  });

  // A streamed upload is where the SDK's default checksums switch to aws-chunked encoding, which
  // s3rver stores framing and all (the object comes back 54 bytes longer): the client must
  // compute checksums only WHEN_REQUIRED.
  it("returns a streamed 300 KiB upload byte for byte", async () => {
    const key = `test/${randomUUID()}.pdf`;
    const body = randomBytes(300 * 1024);
    const stream = Readable.from([body.subarray(0, 100 * 1024), body.subarray(100 * 1024)]);
    await putObject({ key, body: stream, contentLength: body.length, contentType: "application/pdf" });
    const back = await getObject(key);
    expect(back?.body.length).toBe(body.length);
    expect(back?.body.equals(body)).toBe(true);
  });

  it("answers null for a key that does not exist", async () => {
    expect(await getObject(`test/missing-${randomUUID()}`)).toBeNull();
  });
});
