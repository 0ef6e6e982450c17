import { randomUUID } from "node:crypto";
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { ApiClient } from "../support/api-client";
import { demoIds, demoLogin, otherFirmLogin } from "../support/demo-fixtures";
import { seedPackage, seedUser } from "../support/seed";
import { pngForm, TINY_PNG } from "../support/tiny-png";
import { figureKey } from "@/lib/figures/figure-key";
import { putObject } from "@/lib/storage/put-object";

/**
 * Every route handler × every kind of caller → the status each must get.
 * Signed out: 401. Another firm: 404 (never a 403 that confirms the row exists).
 * A role without the permission: 403.
 */
type Actor = "anon" | "engineer" | "checker" | "pe" | "admin" | "other";
const actors: Actor[] = ["anon", "engineer", "checker", "pe", "admin", "other"];

type Ids = Awaited<ReturnType<typeof demoIds>>;
type Row = {
  method: string;
  route: string;
  /** Builds the concrete path and body; runs before every cell so mutations never share a target. */
  prepare: (ids: Ids) => Promise<{ path: string; body?: unknown }>;
  expect: Record<Actor, number>;
};

const all = (status: number): Record<Actor, number> => ({ anon: status, engineer: status, checker: status, pe: status, admin: status, other: status });
const readers = { anon: 401, engineer: 200, checker: 200, pe: 200, admin: 200, other: 404 };

async function freshViewer(ids: Ids) {
  const u = await seedUser({ firmId: ids.firmId });
  await db().insert({ projectId: ids.footbridgeId, userId: u.id, role: "viewer" }).into("projectMemberships");
  return u.id;
}

const matrix: Row[] = [
  { method: "GET", route: "/api/auth/[...nextauth]", prepare: async () => ({ path: "/api/auth/session" }), expect: all(200) },
  { method: "POST", route: "/api/auth/[...nextauth]", prepare: async () => ({ path: "/api/auth/signout" }), expect: all(302) },
  { method: "GET", route: "/api/v1/health", prepare: async () => ({ path: "/api/v1/health" }), expect: all(200) },
  { method: "GET", route: "/api/v1/dev/mail", prepare: async () => ({ path: "/api/v1/dev/mail" }), expect: all(200) },
  {
    method: "POST",
    route: "/api/v1/invitations/accept",
    prepare: async () => ({ path: "/api/v1/invitations/accept", body: { token: "x".repeat(40), password: "long-enough-password" } }),
    expect: all(404),
  },
  { method: "GET", route: "/api/v1/account", prepare: async () => ({ path: "/api/v1/account" }), expect: { ...all(200), anon: 401 } },
  { method: "PATCH", route: "/api/v1/account", prepare: async () => ({ path: "/api/v1/account", body: {} }), expect: { ...all(200), anon: 401 } },
  { method: "GET", route: "/api/v1/projects", prepare: async () => ({ path: "/api/v1/projects" }), expect: { ...all(200), anon: 401 } },
  {
    method: "POST",
    route: "/api/v1/projects",
    prepare: async () => ({ path: "/api/v1/projects", body: { name: "Matrix project", jobNumber: `MX-${randomUUID().slice(0, 8)}` } }),
    expect: { ...all(201), anon: 401 },
  },
  { method: "GET", route: "/api/v1/projects/[projectId]", prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}` }), expect: readers },
  {
    method: "PATCH",
    route: "/api/v1/projects/[projectId]",
    prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}`, body: { client: "Alder Creek Parks Trust" } }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 200, admin: 200, other: 404 },
  },
  { method: "GET", route: "/api/v1/projects/[projectId]/members", prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}/members` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/projects/[projectId]/members",
    prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}/members`, body: { email: `mx-${randomUUID().slice(0, 8)}@test.example`, name: "Matrix Invitee", role: "viewer" } }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 201, admin: 201, other: 404 },
  },
  {
    method: "PATCH",
    route: "/api/v1/projects/[projectId]/members/[userId]",
    prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}/members/${await freshViewer(i)}`, body: { role: "checker" } }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 200, admin: 200, other: 404 },
  },
  {
    method: "DELETE",
    route: "/api/v1/projects/[projectId]/members/[userId]",
    prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}/members/${await freshViewer(i)}` }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 204, admin: 204, other: 404 },
  },
  { method: "GET", route: "/api/v1/projects/[projectId]/packages", prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}/packages` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/projects/[projectId]/packages",
    prepare: async (i) => ({ path: `/api/v1/projects/${i.footbridgeId}/packages`, body: { title: "Matrix package" } }),
    expect: { anon: 401, engineer: 201, checker: 403, pe: 201, admin: 403, other: 404 },
  },
  { method: "GET", route: "/api/v1/packages/[packageId]", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}` }), expect: readers },
  {
    method: "PATCH",
    route: "/api/v1/packages/[packageId]",
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId })).id}`, body: { title: "Renamed by matrix" } }),
    expect: { anon: 401, engineer: 200, checker: 403, pe: 200, admin: 403, other: 404 },
  },
  {
    method: "DELETE",
    route: "/api/v1/packages/[packageId]",
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId })).id}` }),
    expect: { anon: 401, engineer: 204, checker: 403, pe: 204, admin: 403, other: 404 },
  },
  {
    method: "PUT",
    route: "/api/v1/packages/[packageId]/document",
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId })).id}/document`, body: { version: 1, document: { type: "doc", content: [] } } }),
    expect: { anon: 401, engineer: 200, checker: 403, pe: 200, admin: 403, other: 404 },
  },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/figures",
    prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/figures`, body: pngForm() }),
    expect: { anon: 401, engineer: 201, checker: 403, pe: 201, admin: 403, other: 404 },
  },
  {
    method: "GET",
    route: "/api/v1/packages/[packageId]/figures/[figureId]",
    prepare: async (i) => {
      const id = randomUUID();
      await putObject({ key: figureKey(i.firmId, i.packageId, id), body: TINY_PNG, contentType: "image/png" });
      return { path: `/api/v1/packages/${i.packageId}/figures/${id}` };
    },
    expect: readers,
  },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/next-revision",
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId, status: "issued" })).id}/next-revision` }),
    expect: { anon: 401, engineer: 200, checker: 403, pe: 200, admin: 403, other: 404 },
  },
  { method: "GET", route: "/api/v1/firm/members", prepare: async () => ({ path: "/api/v1/firm/members" }), expect: { ...all(200), anon: 401 } },
  {
    method: "PATCH",
    route: "/api/v1/firm/members/[userId]",
    prepare: async (i) => ({ path: `/api/v1/firm/members/${(await seedUser({ firmId: i.firmId })).id}`, body: { disabled: true } }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 403, admin: 200, other: 404 },
  },
  { method: "GET", route: "/api/v1/packages/[packageId]/remarks", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/remarks` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/remarks",
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId })).id}/remarks`, body: { text: "Matrix remark." } }),
    expect: { anon: 401, engineer: 201, checker: 201, pe: 201, admin: 403, other: 404 },
  },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/remarks/[remarkId]/replies",
    prepare: async (i) => {
      // A fresh package with an open remark raised by the demo checker.
      const pkg = await seedPackage({ projectId: i.footbridgeId });
      const checker = await db().from("users").select("id").where({ email: demoLogin("checker").email }).first();
      const [remark] = await db().insert({ packageId: pkg.id, text: "Matrix remark.", openedBy: checker.id }).into("remarks").returning("id");
      return { path: `/api/v1/packages/${pkg.id}/remarks/${remark.id}/replies`, body: { text: "Matrix reply." } };
    },
    expect: { anon: 401, engineer: 201, checker: 201, pe: 201, admin: 403, other: 404 },
  },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/remarks/[remarkId]/close",
    prepare: async (i) => {
      // The checker closes the remark they raised; the project engineer closes any remark.
      const pkg = await seedPackage({ projectId: i.footbridgeId });
      const checker = await db().from("users").select("id").where({ email: demoLogin("checker").email }).first();
      const [remark] = await db().insert({ packageId: pkg.id, text: "Matrix remark.", openedBy: checker.id }).into("remarks").returning("id");
      return { path: `/api/v1/packages/${pkg.id}/remarks/${remark.id}/close` };
    },
    expect: { anon: 401, engineer: 403, checker: 200, pe: 200, admin: 403, other: 404 },
  },
  {
    method: "PUT",
    route: "/api/v1/packages/[packageId]/checker",
    prepare: async (i) => {
      const checker = await db().from("users").select("id").where({ email: demoLogin("checker").email }).first();
      return { path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId })).id}/checker`, body: { checkerId: checker.id } };
    },
    expect: { anon: 401, engineer: 403, checker: 403, pe: 200, admin: 403, other: 404 },
  },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/submit",
    prepare: async (i) => {
      // A draft with its checker assigned, so submitting it can succeed.
      const checker = await db().from("users").select("id").where({ email: demoLogin("checker").email }).first();
      const [pkg] = await db().insert({ projectId: i.footbridgeId, title: "Matrix submit", status: "draft", assignedChecker: checker.id }).into("packages").returning("id");
      return { path: `/api/v1/packages/${pkg.id}/submit` };
    },
    expect: { anon: 401, engineer: 200, checker: 403, pe: 200, admin: 403, other: 404 },
  },
  { method: "GET", route: "/api/v1/packages/[packageId]/check-progress", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/check-progress` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/calcs/[calcId]/check",
    prepare: async (i) => {
      // A package in check, assigned to the demo checker, with one formula calc to mark.
      const checker = await db().from("users").select("id").where({ email: demoLogin("checker").email }).first();
      const document = { type: "doc", content: [{ type: "formula", attrs: { id: "calc-mx-0001", label: "F1", inputs: { source: "q = 3 kN/m" } } }] };
      const [pkg] = await db()
        .insert({ projectId: i.footbridgeId, title: "Matrix check", status: "in_check", assignedChecker: checker.id, document: JSON.stringify(document) })
        .into("packages")
        .returning("id");
      return { path: `/api/v1/packages/${pkg.id}/calcs/calc-mx-0001/check`, body: { state: "checked" } };
    },
    expect: { anon: 401, engineer: 403, checker: 200, pe: 403, admin: 403, other: 404 },
  },
  { method: "GET", route: "/api/v1/packages/[packageId]/revisions", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/revisions` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/revisions",
    // A checked package with no calcs and no remarks: its check is complete, so the project engineer can issue it.
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId, status: "checked" })).id}/revisions` }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 201, admin: 403, other: 404 },
  },
];

let ids: Ids;
const clients = {} as Record<Actor, ApiClient>;

beforeAll(async () => {
  ids = await demoIds();
  clients.anon = new ApiClient();
  for (const [actor, login] of [
    ["engineer", demoLogin("engineer")],
    ["checker", demoLogin("checker")],
    ["pe", demoLogin("projectEngineer")],
    ["admin", demoLogin("admin")],
    ["other", otherFirmLogin],
  ] as const) {
    clients[actor] = await ApiClient.signedIn(login.email, login.password);
  }
});
afterAll(closeDb);

describe("authorization matrix", () => {
  it("covers every route handler in app/api", () => {
    const declared = listRouteHandlers(path.resolve("app/api"));
    const covered = new Set(matrix.map((r) => `${r.method} ${r.route}`));
    expect(declared.filter((d) => !covered.has(d))).toEqual([]);
    expect([...covered].filter((c) => !declared.includes(c))).toEqual([]);
  });

  for (const row of matrix) {
    for (const actor of actors) {
      it(`${row.method} ${row.route} as ${actor} → ${row.expect[actor]}`, async () => {
        const { path: p, body } = await row.prepare(ids);
        // Sign-out would end the shared session; give it a throwaway client of the same kind.
        const client = row.route === "/api/auth/[...nextauth]" && row.method === "POST" ? new ApiClient() : clients[actor];
        const res = await client.request(row.method, p, body);
        expect(res.status, res.text.slice(0, 300)).toBe(row.expect[actor]);
        if (res.status >= 400 && p.startsWith("/api/v1")) expect(res.body).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
      });
    }
  }
});

/** `METHOD /api/...` for each export of each route.ts, from the source itself. */
function listRouteHandlers(dir: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const full = path.join(d, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (name === "route.ts") {
        const src = readFileSync(full, "utf8");
        const route = "/api/" + path.relative(dir, path.dirname(full)).split(path.sep).join("/");
        const methods = new Set<string>();
        for (const m of src.matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)) methods.add(m[1]);
        for (const m of src.matchAll(/export \{([^}]*)\}/g)) for (const x of m[1].matchAll(/as (GET|POST|PUT|PATCH|DELETE)\b/g)) methods.add(x[1]);
        for (const m of methods) out.push(`${m} ${route}`);
      }
    }
  };
  walk(dir);
  return out.sort();
}
