import { db, type DbOrTrx } from "@/db/knex";
import { env } from "@/lib/env";
import type { OutgoingMail } from "@/lib/mail/send-mail";
import type { ReviewEvent } from "./review-event";

type Person = { id: string; email: string; name: string; role: string };

type PackageFacts = { id: string; title: string; projectId: string; projectName: string; jobNumber: string; assignedChecker: string | null };

async function packageFacts(packageId: string, trx: DbOrTrx): Promise<PackageFacts | undefined> {
  return trx
    .from("packages as k")
    .join("projects as p", "p.id", "k.projectId")
    .select("k.id", "k.title", "k.projectId", "p.name as projectName", "p.jobNumber", "k.assignedChecker")
    .where("k.id", packageId)
    .first();
}

async function projectPeople(projectId: string, trx: DbOrTrx): Promise<Person[]> {
  return trx
    .from("projectMemberships as m")
    .join("users as u", "u.id", "m.userId")
    .select("u.id", "u.email", "u.name", "m.role")
    .where("m.projectId", projectId)
    .where("u.disabled", false)
    .whereNotNull("u.passwordHash");
}

/**
 * Who hears about a review event, and what they read. Resolved when the job
 * runs, not when the action happens, so the mail names people and titles as
 * they are; an actor never mails themself.
 */
export async function resolveReviewMail(event: ReviewEvent, trx: DbOrTrx = db()): Promise<OutgoingMail[]> {
  const pkg = await packageFacts(event.packageId, trx);
  if (!pkg) return [];
  const people = await projectPeople(pkg.projectId, trx);
  const actor = (await trx.from("users").select("name").where({ id: event.actorId }).first())?.name ?? "Someone";
  const link = `${env().APP_URL}/projects/${pkg.projectId}/packages/${pkg.id}`;
  const about = `${pkg.jobNumber} ${pkg.projectName} — ${pkg.title}`;
  const authors = people.filter((p) => p.role === "engineer" || p.role === "project_engineer");
  const checker = people.filter((p) => p.id === pkg.assignedChecker);

  let to: Person[] = [];
  let subject = "";
  let body = "";
  if (event.kind === "submitted") {
    to = checker;
    subject = `[${pkg.jobNumber}] Submitted for check: ${pkg.title}`;
    body = `${actor} submitted “${pkg.title}” for check. You are its checker: mark each calc checked or returned, and raise remarks where needed.`;
  } else if (event.kind === "remark.raised" || event.kind === "remark.answered") {
    const remark = await trx.from("remarks").select("text", "openedBy", "calcId").where({ id: event.remarkId }).first();
    if (!remark) return [];
    const replies = await trx.from("remarkReplies").select("text").where({ remarkId: event.remarkId }).orderBy("createdAt", "desc").limit(1);
    if (event.kind === "remark.raised") {
      to = [...authors, ...checker];
      subject = `[${pkg.jobNumber}] New remark on ${pkg.title}`;
      body = `${actor} raised a remark:\n\n  “${remark.text}”`;
    } else {
      to = people.filter((p) => p.id === remark.openedBy);
      subject = `[${pkg.jobNumber}] Your remark was answered: ${pkg.title}`;
      body = `${actor} answered your remark “${remark.text}”:\n\n  “${replies[0]?.text ?? ""}”\n\nClose the remark if the answer settles it.`;
    }
  } else if (event.kind === "checked") {
    to = authors;
    subject = `[${pkg.jobNumber}] Checked: ${pkg.title}`;
    body = `Every calc of “${pkg.title}” is checked and no remark is open. The project engineer can now issue the revision.`;
  } else {
    const revision = await trx.from("revisions").select("label", "fingerprint").where({ id: event.revisionId }).first();
    if (!revision) return [];
    to = people.filter((p) => p.role !== "viewer");
    subject = `[${pkg.jobNumber}] Issued: ${pkg.title}, Rev ${revision.label}`;
    body = `${actor} issued Rev ${revision.label} of “${pkg.title}”.\nFingerprint (SHA-256): ${revision.fingerprint}`;
  }
  const unique = [...new Map(to.filter((p) => p.id !== event.actorId).map((p) => [p.email, p])).values()];
  return unique.map((p) => ({ to: p.email, subject, text: `Dear ${p.name},\n\n${body}\n\n${about}\n${link}\n\n— Panelpoint` }));
}
