import { randomUUID } from "node:crypto";
import { db } from "@/db/knex";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import type { ActingUser } from "@/lib/data/users";
import { saveDocument } from "@/lib/packages/save-document";
import { assignChecker } from "@/lib/review/assign-checker";
import { markCalc } from "@/lib/review/mark-calc";
import { seedPackage, seedSealProfile, seedTeam } from "../support/seed";

/** Shared set-up of the review tests (not a test file itself): a team, a package with two formula calcs, and its checker. */

export type FormulaDoc = { type: "doc"; content: unknown[] };

/** A small package: a sentence, F1 (a line load) and F2 (which reads F1). */
export function twoFormulaDocument(q = "3 kN/m"): FormulaDoc {
  return {
    type: "doc",
    content: [
      { type: "paragraph", content: [{ type: "text", text: "Loads on the canopy truss." }] },
      { type: "formula", attrs: { id: "calc-f1-0001", label: "F1", inputs: { source: `q = ${q}` } } },
      { type: "formula", attrs: { id: "calc-f2-0002", label: "F2", inputs: { source: "w = F1.q * 2" } } },
    ],
  };
}

/** Stores a document through the real save path, as the editor would. */
export async function saveAs(actor: ActingUser, projectId: string, packageId: string, document: unknown): Promise<void> {
  const row = await db().from("packages").select("version").where({ id: packageId }).first();
  const saved = await saveDocument({ actor, projectId, packageId, version: row.version, document });
  if (!saved.ok) throw new Error("the fixture's save met a conflict");
}

/**
 * A team and a draft package holding `document`, its checker assigned by the project engineer unless told otherwise.
 * The project engineer has a valid seal profile (issuing needs one) unless `seal: false`.
 */
export async function reviewTeam(o: { document?: unknown; assign?: boolean; seal?: boolean } = {}) {
  const team = await seedTeam();
  if (o.seal ?? true) await seedSealProfile(team.pe);
  const pkg = await seedPackage({ projectId: team.project.id, title: `Review ${randomUUID().slice(0, 6)}` });
  await saveAs(team.engineer, team.project.id, pkg.id, o.document ?? twoFormulaDocument());
  if (o.assign ?? true) await assignChecker({ actor: team.pe, packageId: pkg.id, checkerId: team.checker.id });
  return { ...team, packageId: pkg.id };
}

/** The checker marks every calc of the package checked. */
export async function checkEveryCalc(checker: ActingUser, packageId: string): Promise<void> {
  const row = await db().from("packages").select("document").where({ id: packageId }).first();
  for (const calc of extractCalcs(row.document)) await markCalc({ actor: checker, packageId, calcId: calc.id, state: "checked" });
}

export async function statusOf(packageId: string): Promise<string> {
  const row = await db().from("packages").select("status").where({ id: packageId }).first();
  return row.status as string;
}
