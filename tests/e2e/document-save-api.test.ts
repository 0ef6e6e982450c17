import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { ApiClient } from "../support/api-client";
import { demoIds, demoLogin } from "../support/demo-fixtures";
import { seedPackage } from "../support/seed";

let engineer: ApiClient;
let checker: ApiClient;
let ids: Awaited<ReturnType<typeof demoIds>>;

type Pkg = { package: { version: number; document: { type: string; content: unknown[] } } };

beforeAll(async () => {
  ids = await demoIds();
  engineer = await ApiClient.signedIn(demoLogin("engineer").email, demoLogin("engineer").password);
  checker = await ApiClient.signedIn(demoLogin("checker").email, demoLogin("checker").password);
});
afterAll(closeDb);

async function fresh() {
  const { id } = await seedPackage({ projectId: ids.footbridgeId });
  return id;
}

const para = (text: string) => ({ type: "paragraph", content: [{ type: "text", text }] });

describe("saving a package document", () => {
  it("stores a valid document, bumps the version, and answers 409 with the newer version to a stale save", async () => {
    const id = await fresh();
    const first = await engineer.request("PUT", `/api/v1/packages/${id}/document`, { version: 1, document: { type: "doc", content: [para("First words.")] } });
    expect(first.status, first.text).toBe(200);
    expect(first.body).toMatchObject({ version: 2 });
    const stale = await engineer.request("PUT", `/api/v1/packages/${id}/document`, { version: 1, document: { type: "doc", content: [para("Other words.")] } });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ error: { code: "CONFLICT" }, current: { version: 2, savedBy: "Tomas Lindqvist" } });
    const stored = (await engineer.request("GET", `/api/v1/packages/${id}`)).body as Pkg;
    expect(stored.package.document.content).toEqual([para("First words.")]);
  });

  it("keeps the seeded footbridge package valid: the server accepts it back unchanged", async () => {
    const current = (await engineer.request("GET", `/api/v1/packages/${ids.trussPackageId}`)).body as Pkg;
    expect(current.package.document.content.length).toBeGreaterThan(10);
    const id = await fresh();
    const res = await engineer.request("PUT", `/api/v1/packages/${id}/document`, { version: 1, document: current.package.document });
    expect(res.status, res.text.slice(0, 300)).toBe(200);
  });

  for (const [what, document, expected] of [
    ["an unknown node type", { type: "doc", content: [{ type: "marquee", content: [] }] }, /marquee|type/i],
    ["an unknown attribute", { type: "doc", content: [{ type: "paragraph", attrs: { colour: "red" } }] }, /colour|attr/i],
    ["a calc with invalid inputs", { type: "doc", content: [{ type: "formula", attrs: { id: "11111111-1111-4111-8111-111111111111", label: "F1", inputs: { source: 42 } } }] }, /F1/],
    ["5 MB of pasted garbage", { type: "doc", content: [para("x".repeat(5 * 1024 * 1024))] }, /large|size|MB|long/i],
  ] as const) {
    it(`refuses ${what} with a clear message and leaves the stored document unchanged`, async () => {
      const id = await fresh();
      const res = await engineer.request("PUT", `/api/v1/packages/${id}/document`, { version: 1, document });
      expect(res.status, res.text.slice(0, 300)).toBe(422);
      expect((res.body as { error: { message: string } }).error.message).toMatch(expected);
      const stored = (await engineer.request("GET", `/api/v1/packages/${id}`)).body as Pkg;
      expect(stored.package.version).toBe(1);
      expect(stored.package.document).toEqual({ type: "doc", content: [] });
    });
  }

  it("answers 403 to a checker's save and stores nothing", async () => {
    const id = await fresh();
    const res = await checker.request("PUT", `/api/v1/packages/${id}/document`, { version: 1, document: { type: "doc", content: [para("Checker text.")] } });
    expect(res.status).toBe(403);
    const stored = (await engineer.request("GET", `/api/v1/packages/${id}`)).body as Pkg;
    expect(stored.package.version).toBe(1);
  });
});
