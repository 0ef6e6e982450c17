import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { ApiClient } from "../support/api-client";
import { demoIds, demoLogin } from "../support/demo-fixtures";

let engineer: ApiClient;
let checker: ApiClient;
let pe: ApiClient;
let ids: Awaited<ReturnType<typeof demoIds>>;
let checkerId: string;

type ErrorBody = { error: { code: string; message: string } };

beforeAll(async () => {
  ids = await demoIds();
  const signIn = (key: "engineer" | "checker" | "projectEngineer") => ApiClient.signedIn(demoLogin(key).email, demoLogin(key).password);
  [engineer, checker, pe] = await Promise.all([signIn("engineer"), signIn("checker"), signIn("projectEngineer")]);
  checkerId = (await db().from("users").select("id").where({ email: demoLogin("checker").email }).first()).id as string;
});
afterAll(closeDb);

/** A package in check on the footbridge, assigned to the demo checker, with one formula calc F1. */
async function packageInCheck(): Promise<string> {
  const document = { type: "doc", content: [{ type: "formula", attrs: { id: "calc-rv-0001", label: "F1", inputs: { source: "q = 3 kN/m" } } }] };
  const [pkg] = await db()
    .insert({ projectId: ids.footbridgeId, title: `Review API ${randomUUID().slice(0, 6)}`, status: "in_check", assignedChecker: checkerId, document: JSON.stringify(document) })
    .into("packages")
    .returning("id");
  return pkg.id as string;
}

describe("the review API", () => {
  it("lets the checker raise a remark (201) and the engineer answer it, but not close it", async () => {
    const id = await packageInCheck();
    const raised = await checker.request("POST", `/api/v1/packages/${id}/remarks`, { calcId: "calc-rv-0001", text: "Where does 3 kN/m come from?" });
    expect(raised.status, raised.text).toBe(201);
    const remarkId = (raised.body as { id: string }).id;

    const reply = await engineer.request("POST", `/api/v1/packages/${id}/remarks/${remarkId}/replies`, { text: "Deck self-weight, see section 2." });
    expect(reply.status, reply.text).toBe(201);
    expect(reply.body).toMatchObject({ state: "answered" });

    const close = await engineer.request("POST", `/api/v1/packages/${id}/remarks/${remarkId}/close`);
    expect(close.status, close.text).toBe(403);
    expect((close.body as ErrorBody).error).toMatchObject({ code: "FORBIDDEN", message: expect.stringContaining("remark.close") });

    const list = await engineer.request("GET", `/api/v1/packages/${id}/remarks`);
    expect(list.status).toBe(200);
    const remarks = (list.body as { remarks: { id: string; state: string; replies: { text: string }[] }[] }).remarks;
    expect(remarks.map((r) => [r.id, r.state, r.replies.map((p) => p.text)])).toEqual([[remarkId, "answered", ["Deck self-weight, see section 2."]]]);
  });

  it("lets the checker close their own remark once, and answers 409 with the reason to a second close", async () => {
    const id = await packageInCheck();
    const raised = await checker.request("POST", `/api/v1/packages/${id}/remarks`, { text: "State the deflection limit." });
    const remarkId = (raised.body as { id: string }).id;
    const first = await checker.request("POST", `/api/v1/packages/${id}/remarks/${remarkId}/close`);
    expect(first.status, first.text).toBe(200);
    const again = await checker.request("POST", `/api/v1/packages/${id}/remarks/${remarkId}/close`);
    expect(again.status).toBe(409);
    expect((again.body as ErrorBody).error).toMatchObject({ code: "CONFLICT", message: "This remark is already closed." });
  });

  it("refuses to issue while a calc is unchecked, naming it, then issues once the checker has checked it", async () => {
    const id = await packageInCheck();
    const refused = await pe.request("POST", `/api/v1/packages/${id}/revisions`);
    expect(refused.status, refused.text).toBe(409);
    expect((refused.body as ErrorBody).error).toMatchObject({ code: "CONFLICT", message: expect.stringContaining("1 of 1 calcs not checked: F1 (unchecked)") });

    const progress = await engineer.request("GET", `/api/v1/packages/${id}/check-progress`);
    expect(progress.body).toMatchObject({ total: 1, checked: 0, complete: false });

    const mark = await checker.request("POST", `/api/v1/packages/${id}/calcs/calc-rv-0001/check`, { state: "checked" });
    expect(mark.status, mark.text).toBe(200);
    expect(mark.body).toMatchObject({ status: "checked" });

    const issued = await pe.request("POST", `/api/v1/packages/${id}/revisions`);
    expect(issued.status, issued.text).toBe(201);
    expect(issued.body).toMatchObject({ number: 0, fingerprint: expect.stringMatching(/^[0-9a-f]{64}$/) });

    const revisions = await engineer.request("GET", `/api/v1/packages/${id}/revisions`);
    expect((revisions.body as { revisions: { number: number; fingerprintOk: boolean }[] }).revisions.map((r) => [r.number, r.fingerprintOk])).toEqual([[0, true]]);
  });
});
