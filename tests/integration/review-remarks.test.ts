import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { closeRemark } from "@/lib/review/close-remark";
import { createRemark } from "@/lib/review/create-remark";
import { listRemarks } from "@/lib/review/list-remarks";
import { replyToRemark } from "@/lib/review/reply-to-remark";
import { seedTeam } from "../support/seed";
import { reviewTeam, saveAs, twoFormulaDocument } from "./review-fixtures";

afterAll(closeDb);

const remarkState = async (id: string) => (await db().from("remarks").select("state").where({ id }).first()).state as string;

describe("remarks", () => {
  it("goes open → answered when the author replies, and closed when the checker who raised it closes it", async () => {
    const t = await reviewTeam();
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", text: "Where does 3 kN/m come from?" });
    expect(await remarkState(r.id)).toBe("open");
    const reply = await replyToRemark({ actor: t.engineer, packageId: t.packageId, remarkId: r.id, text: "Deck self-weight, see section 2." });
    expect(reply.state).toBe("answered");
    await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: r.id });
    expect(await remarkState(r.id)).toBe("closed");
    const thread = await db().from("remarkReplies").select("author", "text").where({ remarkId: r.id });
    expect(thread).toEqual([{ author: t.engineer.id, text: "Deck self-weight, see section 2." }]);
  });

  it("reopens an answered remark when the checker who raised it replies again", async () => {
    const t = await reviewTeam();
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, text: "State the deflection limit." });
    await replyToRemark({ actor: t.engineer, packageId: t.packageId, remarkId: r.id, text: "Added." });
    expect((await replyToRemark({ actor: t.checker, packageId: t.packageId, remarkId: r.id, text: "Not in section 1 yet." })).state).toBe("open");
  });

  it("refuses an engineer closing a checker's remark, saying who may close it", async () => {
    const t = await reviewTeam();
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-f2-0002", text: "Factor 2 is not justified." });
    await expect(closeRemark({ actor: t.engineer, packageId: t.packageId, remarkId: r.id })).rejects.toMatchObject({
      code: "FORBIDDEN",
      message: expect.stringContaining("Only Checker, who raised this remark, or the project engineer can close it"),
    });
    expect(await remarkState(r.id)).toBe("open");
  });

  it("lets the project engineer close any remark", async () => {
    const t = await reviewTeam();
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, text: "Check the units." });
    await closeRemark({ actor: t.pe, packageId: t.packageId, remarkId: r.id });
    expect(await remarkState(r.id)).toBe("closed");
  });

  it("keeps a remark whose calc was deleted, listed as detached, with its thread", async () => {
    const t = await reviewTeam();
    const closed = await createRemark({ actor: t.checker, packageId: t.packageId, text: "Title typo." });
    await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: closed.id });
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-f2-0002", text: "Is F2 needed?" });
    await replyToRemark({ actor: t.engineer, packageId: t.packageId, remarkId: r.id, text: "No, removed." });
    const withoutF2 = twoFormulaDocument();
    withoutF2.content = withoutF2.content.slice(0, 2);
    await saveAs(t.engineer, t.project.id, t.packageId, withoutF2);
    const list = await listRemarks({ actor: t.viewer, packageId: t.packageId });
    expect(list.map((x) => [x.text, x.state, x.detached])).toEqual([["Is F2 needed?", "answered", true], ["Title typo.", "closed", false]]);
    expect(list[0].replies.map((p) => [p.authorName, p.text])).toEqual([["Engineer", "No, removed."]]);
  });

  it("anchors a remark to a range of text with its quote", async () => {
    const t = await reviewTeam();
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, anchor: { from: 0, to: 5, quote: "Loads" }, text: "Which loads?" });
    const row = await db().from("remarks").select("anchor", "calcId").where({ id: r.id }).first();
    expect(row).toEqual({ anchor: { from: 0, to: 5, quote: "Loads" }, calcId: null });
  });

  it("refuses a remark on a calc the package does not have, and one from a viewer", async () => {
    const t = await reviewTeam();
    await expect(createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-none-9999", text: "?" })).rejects.toMatchObject({ code: "INVALID", path: "calcId" });
    await expect(createRemark({ actor: t.viewer, packageId: t.packageId, text: "Looks fine" })).rejects.toMatchObject({ code: "FORBIDDEN" });
  });

  it("answers not found to a person of another firm, and to someone not on the project", async () => {
    const t = await reviewTeam();
    const other = await seedTeam();
    await expect(createRemark({ actor: other.checker, packageId: t.packageId, text: "Hello" })).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(createRemark({ actor: t.outsider, packageId: t.packageId, text: "Hello" })).rejects.toMatchObject({ code: "NOT_FOUND" });
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, text: "Mine" });
    await expect(closeRemark({ actor: other.pe, packageId: t.packageId, remarkId: r.id })).rejects.toMatchObject({ code: "NOT_FOUND" });
  });

  it("records every remark change in the audit log", async () => {
    const t = await reviewTeam();
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, text: "Audit me." });
    await replyToRemark({ actor: t.engineer, packageId: t.packageId, remarkId: r.id, text: "Done." });
    await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: r.id });
    const actions = await db().from("auditLog").select("action").where({ entityId: r.id }).orderBy("id");
    expect(actions.map((a) => a.action)).toEqual(["remark.create", "remark.reply", "remark.close"]);
  });
});
