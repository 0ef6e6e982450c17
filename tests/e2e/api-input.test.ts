import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { ApiClient } from "../support/api-client";
import { demoIds, demoLogin } from "../support/demo-fixtures";
import { seedFirm, seedUser, TEST_PASSWORD } from "../support/seed";

let pe: ApiClient;
let checker: ApiClient;
let ids: Awaited<ReturnType<typeof demoIds>>;

beforeAll(async () => {
  ids = await demoIds();
  pe = await ApiClient.signedIn(demoLogin("projectEngineer").email, demoLogin("projectEngineer").password);
  checker = await ApiClient.signedIn(demoLogin("checker").email, demoLogin("checker").password);
});
afterAll(closeDb);

describe("bad input gets a clear answer, never a 500", () => {
  it("answers 422 naming `name` when a project has no name", async () => {
    const res = await pe.request("POST", "/api/v1/projects", { jobNumber: "KV-X-1" });
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({ error: { code: "INVALID", path: "name" } });
  });

  it("answers 400 for a body that is not JSON", async () => {
    const res = await pe.request("POST", "/api/v1/projects", undefined, "{ name: oops");
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: "BAD_REQUEST" } });
  });

  it("answers 422 naming the nested field of a wrong type", async () => {
    const res = await pe.request("POST", "/api/v1/projects", { name: "X", jobNumber: "Y", designCodes: ["ok", 7] });
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({ error: { path: "designCodes[1]" } });
  });

  it("refuses unknown project settings instead of ignoring them", async () => {
    const res = await pe.request("PATCH", `/api/v1/projects/${ids.footbridgeId}`, { colour: "red" });
    expect(res.status).toBe(422);
  });

  it("answers 409 for a job number the firm already uses", async () => {
    const res = await pe.request("POST", "/api/v1/projects", { name: "Duplicate", jobNumber: "KV-2026-014" });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ error: { code: "CONFLICT", path: "jobNumber" } });
  });

  it("answers 404 for an id that is not a uuid, and for one that does not exist", async () => {
    expect((await pe.request("GET", "/api/v1/projects/not-a-uuid")).status).toBe(404);
    expect((await pe.request("GET", "/api/v1/packages/00000000-0000-4000-8000-000000000000")).status).toBe(404);
  });

  it("answers 403 to a checker creating a package, before looking at the body", async () => {
    const res = await checker.request("POST", `/api/v1/projects/${ids.footbridgeId}/packages`, undefined, "not json");
    expect(res.status).toBe(403);
  });

  it("feeds random junk to every writing route without a 500", async () => {
    const junk = [undefined, "null", "[]", '"text"', "123", '{"title": {"$gt": ""}}', '{"name": "' + "x".repeat(5000) + '"}', "\u0000"];
    const paths = [
      ["POST", "/api/v1/projects"],
      ["PATCH", `/api/v1/projects/${ids.footbridgeId}`],
      ["POST", `/api/v1/projects/${ids.footbridgeId}/members`],
      ["POST", `/api/v1/projects/${ids.footbridgeId}/packages`],
      ["PATCH", "/api/v1/account"],
    ];
    for (const [method, p] of paths) {
      for (const body of junk) {
        const res = await pe.request(method, p, undefined, body);
        expect(res.status, `${method} ${p} with ${String(body).slice(0, 20)}`).toBeLessThan(500);
      }
    }
  });
});

describe("sign-in throttle over HTTP", () => {
  it("throttles the sixth attempt after five failures with a clear message", async () => {
    const firm = await seedFirm();
    const u = await seedUser({ firmId: firm.id });
    const c = new ApiClient();
    for (let i = 0; i < 5; i++) expect(await c.signIn(u.email, "wrong-password")).toBe("E-mail or password is not right.");
    expect(await c.signIn(u.email, TEST_PASSWORD)).toMatch(/Too many failed sign-ins for this account/);
  });
});
