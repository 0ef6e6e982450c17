import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { recordAudit } from "@/lib/data/audit";
import { seedFirm } from "../support/seed";

afterAll(closeDb);

describe("the audit log", () => {
  it("accepts appends", async () => {
    const firm = await seedFirm();
    await recordAudit({ firmId: firm.id, actorId: null, action: "test.append", entityType: "firm", entityId: firm.id });
    const rows = await db().from("auditLog").where({ firmId: firm.id });
    expect(rows).toHaveLength(1);
    expect(rows[0].action).toBe("test.append");
  });

  it("refuses updates and deletes in the database itself", async () => {
    const firm = await seedFirm();
    await recordAudit({ firmId: firm.id, actorId: null, action: "test.keep", entityType: "firm" });
    await expect(db().from("auditLog").where({ firmId: firm.id }).update({ action: "rewritten" })).rejects.toThrow(/append-only/);
    await expect(db().from("auditLog").where({ firmId: firm.id }).delete()).rejects.toThrow(/append-only/);
    const rows = await db().from("auditLog").where({ firmId: firm.id });
    expect(rows.map((r) => r.action)).toEqual(["test.keep"]);
  });
});
