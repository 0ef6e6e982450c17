import type { Trx } from "@/db/knex";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import type { ActingUser } from "@/lib/data/users";
import type { RemarkAnchor } from "./create-remark";
import { quoteInDocument } from "./find-quote";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type RemarkReply = { id: string; authorId: string; authorName: string; text: string; createdAt: Date };

export type RemarkThread = {
  id: string;
  calcId: string | null;
  anchor: RemarkAnchor | null;
  text: string;
  state: "open" | "answered" | "closed";
  openedBy: string;
  openerName: string;
  createdAt: Date;
  closedAt: Date | null;
  /** The calc it was on, or the words it quoted, are no longer in the document: kept and shown as detached, never lost. */
  detached: boolean;
  replies: RemarkReply[];
};

export type ListRemarksOptions = { actor: ActingUser; packageId: string; trx?: Trx };

const stateOrder = { open: 0, answered: 1, closed: 2 } as const;

/** Every remark of a package with its thread, for the side panel: open first, then answered, then closed; oldest first within each. */
export async function listRemarks({ actor, packageId, trx }: ListRemarksOptions): Promise<RemarkThread[]> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "package.read", refusal: "You cannot read this package.", lock: false, trx: t });
    const calcIds = new Set(extractCalcs(pkg.document).map((c) => c.id));
    const remarks: Omit<RemarkThread, "detached" | "replies">[] = await t
      .from("remarks as r")
      .join("users as u", "u.id", "r.openedBy")
      .select("r.id", "r.calcId", "r.anchor", "r.text", "r.state", "r.openedBy", "u.name as openerName", "r.createdAt", "r.closedAt")
      .where("r.packageId", pkg.id)
      .orderBy([{ column: "r.createdAt" }, { column: "r.id" }]);
    const replies: (RemarkReply & { remarkId: string })[] = await t
      .from("remarkReplies as p")
      .join("remarks as r", "r.id", "p.remarkId")
      .join("users as u", "u.id", "p.author")
      .select("p.id", "p.remarkId", "p.author as authorId", "u.name as authorName", "p.text", "p.createdAt")
      .where("r.packageId", pkg.id)
      .orderBy([{ column: "p.createdAt" }, { column: "p.id" }]);
    const threads = new Map<string, RemarkReply[]>();
    for (const p of replies) {
      const thread = threads.get(p.remarkId) ?? [];
      thread.push({ id: p.id, authorId: p.authorId, authorName: p.authorName, text: p.text, createdAt: p.createdAt });
      threads.set(p.remarkId, thread);
    }
    return remarks
      .map((r) => ({ ...r, detached: (r.calcId !== null && !calcIds.has(r.calcId)) || (r.anchor !== null && !quoteInDocument(pkg.document, r.anchor.quote)), replies: threads.get(r.id) ?? [] }))
      .sort((a, b) => stateOrder[a.state] - stateOrder[b.state]);
  });
}
