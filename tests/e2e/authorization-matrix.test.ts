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
import { signExportLink } from "@/lib/exports/export-link";
import { exportObjectKey } from "@/lib/exports/export-object-key";
import { findSealProfile } from "@/lib/data/seal-profiles";
import { uploadSealImage } from "@/lib/seals/upload-seal-image";
import { computeFingerprint } from "@/lib/review/compute-fingerprint";
import { demoSealProfile, demoSealSvg } from "@/db/demo/demo-seal";

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

/** The demo seal as a multipart upload. */
function sealForm(): FormData {
  const form = new FormData();
  form.set("file", new Blob([demoSealSvg], { type: "image/svg+xml" }), "seal.svg");
  return form;
}

/** Every signed-in caller of the matrix gets a seal image (the demo project engineer has one already), so reading one's own can answer 200. */
async function ensureSealImages(): Promise<void> {
  for (const email of [demoLogin("engineer").email, demoLogin("checker").email, demoLogin("projectEngineer").email, demoLogin("admin").email, otherFirmLogin.email]) {
    const u = await db().from("users as u").join("firmMemberships as fm", "fm.userId", "u.id").select("u.id", "fm.firmId").where("u.email", email).first();
    const profile = await findSealProfile({ userId: u.id, firmId: u.firmId });
    if (!profile?.imageKey) await uploadSealImage({ actor: { id: u.id, firmId: u.firmId }, bytes: Buffer.from(demoSealSvg, "utf8") });
  }
}

/** A draft package after an issued Rev 0 (inserted as issued), optionally with one plan-review comment on Rev 0. */
async function planReviewDraft(ids: Ids, o: { comment?: boolean } = {}) {
  const pkg = await seedPackage({ projectId: ids.footbridgeId, status: "draft" });
  const pe = await db().from("users").select("id").where({ email: demoLogin("projectEngineer").email }).first();
  const frozen = { document: { type: "doc", content: [] }, results: {}, checkRecord: { calcs: [], remarks: [] }, number: 0 };
  const [rev] = await db()
    .insert({ packageId: pkg.id, number: 0, label: "0", document: JSON.stringify(frozen.document), results: "{}", checkRecord: JSON.stringify(frozen.checkRecord), issuedBy: pe.id, issuedAt: new Date(), fingerprint: computeFingerprint(frozen) })
    .into("revisions")
    .returning("id");
  let commentId: string | undefined;
  if (o.comment) {
    const [c] = await db()
      .insert({ firmId: ids.firmId, projectId: ids.footbridgeId, packageId: pkg.id, revisionId: rev.id, number: "1", position: 1, text: "Matrix comment.", createdBy: pe.id })
      .into("planReviewComments")
      .returning("id");
    commentId = c.id;
  }
  return { packageId: pkg.id as string, revisionId: rev.id as string, commentId };
}

/** A finished export of a fresh package on the footbridge, its file in S3; with `issued`, of an issued revision, signed, with a verification token. */
async function doneExport(ids: Ids, issued = false): Promise<{ id: string; token: string | null }> {
  const pkg = await seedPackage({ projectId: ids.footbridgeId, status: issued ? "issued" : "draft" });
  const pe = await db().from("users").select("id").where({ email: demoLogin("projectEngineer").email }).first();
  let revisionId: string | null = null;
  if (issued) {
    const [rev] = await db()
      .insert({ packageId: pkg.id, number: 0, label: "0", document: JSON.stringify({ type: "doc", content: [] }), results: "{}", checkRecord: JSON.stringify({ calcs: [], remarks: [] }), issuedBy: pe.id, issuedAt: new Date(), fingerprint: "0".repeat(64) })
      .into("revisions")
      .returning("id");
    revisionId = rev.id;
  }
  const token = issued ? randomUUID().replace(/-/g, "").slice(0, 24) : null;
  const [row] = await db()
    .insert({ firmId: ids.firmId, projectId: ids.footbridgeId, packageId: pkg.id, revisionId, format: "pdf", status: "done", signed: issued, verifyToken: token, requestedBy: pe.id, sha256: "a".repeat(64), byteSize: 4, finishedAt: new Date() })
    .into("exports")
    .returning("id");
  await db().from("exports").where({ id: row.id }).update({ objectKey: exportObjectKey(ids.firmId, row.id, "pdf") });
  await putObject({ key: exportObjectKey(ids.firmId, row.id, "pdf"), body: Buffer.from("%PDF"), contentType: "application/pdf" });
  return { id: row.id, token };
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
  { method: "GET", route: "/api/v1/account/seal", prepare: async () => ({ path: "/api/v1/account/seal" }), expect: { ...all(200), anon: 401 } },
  // Everyone manages only their own seal; the demo's values keep the demo project engineer's seal as it was.
  { method: "PUT", route: "/api/v1/account/seal", prepare: async () => ({ path: "/api/v1/account/seal", body: demoSealProfile }), expect: { ...all(200), anon: 401 } },
  { method: "PUT", route: "/api/v1/account/seal/image", prepare: async () => ({ path: "/api/v1/account/seal/image", body: sealForm() }), expect: { ...all(200), anon: 401 } },
  {
    method: "GET",
    route: "/api/v1/account/seal/image",
    prepare: async () => {
      await ensureSealImages();
      return { path: "/api/v1/account/seal/image" };
    },
    expect: { ...all(200), anon: 401 },
  },
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
  {
    method: "GET",
    route: "/api/v1/packages/[packageId]/compare",
    prepare: async (i) => {
      // A package with one revision (inserted as issued) compared with its draft.
      const pkg = await seedPackage({ projectId: i.footbridgeId, status: "draft" });
      const pe = await db().from("users").select("id").where({ email: demoLogin("projectEngineer").email }).first();
      const frozen = { document: { type: "doc", content: [] }, results: {}, checkRecord: { calcs: [], remarks: [] }, number: 0 };
      const [rev] = await db()
        .insert({ packageId: pkg.id, number: 0, label: "0", document: JSON.stringify(frozen.document), results: "{}", checkRecord: JSON.stringify(frozen.checkRecord), issuedBy: pe.id, issuedAt: new Date(), fingerprint: computeFingerprint(frozen) })
        .into("revisions")
        .returning("id");
      return { path: `/api/v1/packages/${pkg.id}/compare?from=${rev.id}&to=draft` };
    },
    expect: readers,
  },
  { method: "GET", route: "/api/v1/packages/[packageId]/revisions", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/revisions` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/revisions",
    // A checked package with no calcs and no remarks: its check is complete, so the project engineer can issue it.
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId, status: "checked" })).id}/revisions` }),
    expect: { anon: 401, engineer: 403, checker: 403, pe: 201, admin: 403, other: 404 },
  },
  { method: "GET", route: "/api/v1/packages/[packageId]/plan-review", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/plan-review` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/plan-review",
    prepare: async (i) => {
      const d = await planReviewDraft(i);
      return { path: `/api/v1/packages/${d.packageId}/plan-review`, body: { revisionId: d.revisionId, reviewer: "Matrix Reviewer", paste: "1. Provide the wind load.\n2. Verify joint L2." } };
    },
    expect: { anon: 401, engineer: 403, checker: 403, pe: 201, admin: 403, other: 404 },
  },
  {
    method: "PATCH",
    route: "/api/v1/packages/[packageId]/plan-review/[commentId]",
    prepare: async (i) => {
      const d = await planReviewDraft(i, { comment: true });
      return { path: `/api/v1/packages/${d.packageId}/plan-review/${d.commentId}`, body: { response: "Added in the draft." } };
    },
    expect: { anon: 401, engineer: 403, checker: 403, pe: 200, admin: 403, other: 404 },
  },
  {
    method: "DELETE",
    route: "/api/v1/packages/[packageId]/plan-review/[commentId]",
    prepare: async (i) => {
      const d = await planReviewDraft(i, { comment: true });
      return { path: `/api/v1/packages/${d.packageId}/plan-review/${d.commentId}` };
    },
    expect: { anon: 401, engineer: 403, checker: 403, pe: 204, admin: 403, other: 404 },
  },
  {
    method: "GET",
    route: "/api/v1/packages/[packageId]/plan-review/letter",
    prepare: async (i) => ({ path: `/api/v1/packages/${(await planReviewDraft(i, { comment: true })).packageId}/plan-review/letter` }),
    expect: readers,
  },
  { method: "GET", route: "/api/v1/packages/[packageId]/exports", prepare: async (i) => ({ path: `/api/v1/packages/${i.packageId}/exports` }), expect: readers },
  {
    method: "POST",
    route: "/api/v1/packages/[packageId]/exports",
    // Every project member may export (viewers too, and the firm admin); the job is queued, answered 202.
    prepare: async (i) => ({ path: `/api/v1/packages/${(await seedPackage({ projectId: i.footbridgeId })).id}/exports`, body: { format: "docx" } }),
    expect: { anon: 401, engineer: 202, checker: 202, pe: 202, admin: 202, other: 404 },
  },
  {
    method: "GET",
    route: "/api/v1/exports/[exportId]/download",
    prepare: async (i) => ({ path: signExportLink((await doneExport(i)).id).url }),
    expect: readers,
  },
  {
    method: "GET",
    route: "/api/v1/verify/[token]",
    // Public: the verification page needs no sign-in.
    prepare: async (i) => ({ path: `/api/v1/verify/${(await doneExport(i, true)).token}` }),
    expect: all(200),
  },
  {
    method: "POST",
    route: "/api/v1/verify/[token]",
    prepare: async (i) => ({ path: `/api/v1/verify/${(await doneExport(i, true)).token}`, body: { sha256: "b".repeat(64) } }),
    expect: all(200),
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
