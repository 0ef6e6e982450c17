import { db } from "../../db/knex";
import { findActingUser, type ActingUser } from "../../lib/data/users";
import { numberedHeadings } from "../../lib/document/numbered-headings";
import { demoCalcIds } from "../../lib/document/demo-footbridge-document";
import { saveDocument } from "../../lib/packages/save-document";
import { recordComments } from "../../lib/plan-review/record-comments";
import { updateComment } from "../../lib/plan-review/update-comment";
import { assignChecker } from "../../lib/review/assign-checker";
import { closeRemark } from "../../lib/review/close-remark";
import { createRemark } from "../../lib/review/create-remark";
import { issueRevision } from "../../lib/review/issue-revision";
import { markCalc } from "../../lib/review/mark-calc";
import { replyToRemark } from "../../lib/review/reply-to-remark";
import { startNextRevision } from "../../lib/review/start-next-revision";
import { submitForCheck } from "../../lib/review/submit-for-check";
import { demoPeople } from "./people";

/**
 * The footbridge package's invented history, played through the same
 * operations the app uses (so every rule — checks, seal, fingerprint, audit —
 * applies): checked with remarks, issued as Rev 0, answered by the permit
 * office with three comments, and a draft Rev 1 that raises the dead load in
 * answer, with its responses written and one remark still open.
 */
export const demoPermitComments = `1. The deck dead load of 3.0 kN/m per truss does not appear to include the handrails and the lighting conduit. Revise G or justify the omission.
2. Confirm that the pedestrian live load of 5.0 kN/m² is the value required for this crossing.
3. Show the deflection of the truss under the pedestrian load alone against the limit you adopt.`;

async function person(key: (typeof demoPeople)[number]["key"]): Promise<ActingUser> {
  const p = demoPeople.find((x) => x.key === key)!;
  const row = await db().from("users").select("id").where({ email: p.email }).first();
  return (await findActingUser(row.id))!;
}

async function saveWith(actor: ActingUser, projectId: string, packageId: string, change: (doc: { content: { type: string; attrs?: { id?: string; inputs?: unknown } }[] }) => void) {
  const row = await db().from("packages").select("document", "version").where({ id: packageId }).first();
  const doc = structuredClone(row.document);
  change(doc);
  const saved = await saveDocument({ actor, projectId, packageId, version: row.version, document: doc });
  if (!saved.ok) throw new Error("the demo history met a save conflict");
}

export async function playDemoHistory(): Promise<void> {
  const [engineer, checker, pe] = await Promise.all([person("engineer"), person("checker"), person("projectEngineer")]);
  const pkg = await db()
    .from("packages as k")
    .join("projects as p", "p.id", "k.projectId")
    .where("p.jobNumber", "KV-2026-014")
    .orderBy("k.createdAt")
    .first("k.id", "k.projectId");
  const { id: packageId, projectId } = pkg;

  await assignChecker({ actor: pe, packageId, checkerId: checker.id });
  await submitForCheck({ actor: engineer, packageId });
  const cut = await createRemark({ actor: checker, packageId, calcId: demoCalcIds.S1, text: "Show the moment equation about L3, where U2L3 and L2L3 meet, so that F_U2U3 comes out on its own; say so in the text." });
  await replyToRemark({ actor: engineer, packageId, remarkId: cut.id, text: "S1 now takes its moments about L3 first, which gives F_U2U3 directly; the sentence above S1 says why that pivot was chosen." });
  await closeRemark({ actor: checker, packageId, remarkId: cut.id });
  const joint = await createRemark({ actor: checker, packageId, calcId: demoCalcIds.J1, text: "J1 agrees with T1 at L0. State the sign convention (tension positive) in the text." });
  await replyToRemark({ actor: engineer, packageId, remarkId: joint.id, text: "Added to the analysis paragraph: tension positive throughout." });
  await closeRemark({ actor: checker, packageId, remarkId: joint.id });
  for (const calcId of Object.values(demoCalcIds)) await markCalc({ actor: checker, packageId, calcId, state: "checked" });
  const rev0 = await issueRevision({ actor: pe, packageId });

  await startNextRevision({ actor: pe, packageId });
  const comments = await recordComments({ actor: pe, packageId, input: { revisionId: rev0.id, reviewer: "R. Okafor, Alder Creek Building Division (invented)", receivedOn: "2026-11-24", paste: demoPermitComments } });
  // Rev 1 answers comment 1 by raising G from 3.0 to 3.4 kN/m per truss (handrails 0.25, conduit 0.15).
  await saveWith(engineer, projectId, packageId, (doc) => {
    const truss = doc.content.find((n) => n.attrs?.id === demoCalcIds.T1)!;
    const inputs = truss.attrs!.inputs as { lineLoads: { case: string; w: number }[] };
    inputs.lineLoads.find((l) => l.case === "G")!.w = 3.4;
  });
  const doc = (await db().from("packages").select("document").where({ id: packageId }).first()).document;
  const headingAt = (text: string) => numberedHeadings(doc).find((h) => h.text === text)!;
  const criteria = headingAt("Design criteria");
  const answers: { response: string; answeredIn: unknown[] }[] = [
    { response: "G is raised to 3.4 kN/m per truss: handrails 0.25 kN/m and lighting conduit 0.15 kN/m added to the deck. T1 and every calc that reads it are recomputed in this revision.", answeredIn: [{ type: "calc", calcId: demoCalcIds.T1 }, { type: "calc", calcId: demoCalcIds.C1 }, { type: "calc", calcId: demoCalcIds.M1 }] },
    { response: "5.0 kN/m² is the pedestrian load adopted for the crossing; its basis is stated in the design criteria.", answeredIn: [{ type: "heading", index: criteria.index, text: criteria.text }] },
    { response: "D1 gives the midspan deflection under Q alone by virtual work and compares it with span/360.", answeredIn: [{ type: "calc", calcId: demoCalcIds.D1 }] },
  ];
  for (const [i, c] of comments.entries()) await updateComment({ actor: pe, packageId, commentId: c.id, input: answers[i] });
  await createRemark({ actor: checker, packageId, calcId: demoCalcIds.M1, text: "With G at 3.4 kN/m, please restate the governing combination for the top chord in the text." });
}
