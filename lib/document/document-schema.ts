import { z } from "zod";
import { docNodeSchema } from "./block-node-schemas";
import { checkUniqueCalcs } from "./check-unique-calcs";
import type { PackageDocument } from "./document-types";
import { measureDocument } from "./measure-document";

/**
 * A package document: TipTap/ProseMirror JSON limited to Panelpoint's nodes,
 * marks and attributes (anything else is refused on its path, e.g.
 * `content[3].type` or `content[2].attrs.colour`), every calc's inputs valid
 * for its kind, calc ids and labels unique. Size (≤ 2 MB), node depth (≤ 20)
 * and JSON-ness are checked first, in one cheap pass, so garbage is refused
 * before any node is parsed.
 */
export const documentSchema: z.ZodType<PackageDocument> = z
  .unknown()
  .superRefine((value, ctx) => {
    const measured = measureDocument(value);
    if (!measured.ok) ctx.addIssue({ code: "custom", message: measured.message, path: measured.path ? [measured.path] : [], params: { limit: true } });
  })
  .pipe(docNodeSchema)
  .superRefine(checkUniqueCalcs);
