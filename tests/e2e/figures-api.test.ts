import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { ApiClient } from "../support/api-client";
import { demoIds, demoLogin, otherFirmLogin } from "../support/demo-fixtures";
import { pngForm, TINY_PNG } from "../support/tiny-png";

let engineer: ApiClient;
let ids: Awaited<ReturnType<typeof demoIds>>;

beforeAll(async () => {
  ids = await demoIds();
  engineer = await ApiClient.signedIn(demoLogin("engineer").email, demoLogin("engineer").password);
});
afterAll(closeDb);

describe("figures in the file store", () => {
  it("stores an uploaded PNG and serves the same bytes back to project members only", async () => {
    const up = await engineer.request("POST", `/api/v1/packages/${ids.trussPackageId}/figures`, pngForm());
    expect(up.status, up.text).toBe(201);
    const src = (up.body as { src: string }).src;
    expect(src).toMatch(/^\/api\/v1\/packages\/[0-9a-f-]+\/figures\/[0-9a-f-]+$/);

    const res = await engineer.get(src);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("image/png");
    expect(Buffer.from(await res.arrayBuffer()).equals(TINY_PNG)).toBe(true);

    const other = await ApiClient.signedIn(otherFirmLogin.email, otherFirmLogin.password);
    expect((await other.request("GET", src)).status).toBe(404);
    expect((await new ApiClient().request("GET", src)).status).toBe(401);
  });

  it("refuses a file that is not an image, whatever it claims, naming the field", async () => {
    const form = new FormData();
    form.set("file", new Blob(["<svg onload=alert(1)>"], { type: "image/png" }), "evil.png");
    const res = await engineer.request("POST", `/api/v1/packages/${ids.trussPackageId}/figures`, form);
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({ error: { path: "file" } });
  });
});
