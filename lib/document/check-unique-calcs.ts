import type { z } from "zod";
import { locateCalcs } from "../calcs/locate-calcs";
import type { PackageDocument } from "./document-types";

/**
 * Each calc id and each label once per document: references name labels, and
 * results are kept by id. The second use is reported, on its own attribute.
 */
export function checkUniqueCalcs(doc: PackageDocument, ctx: z.RefinementCtx): void {
  const ids = new Map<string, string>();
  const labels = new Map<string, string>();
  for (const { calc, path } of locateCalcs(doc)) {
    const at = pathSegments(path);
    const firstId = ids.get(calc.id);
    if (firstId !== undefined) ctx.addIssue({ code: "custom", path: [...at, "attrs", "id"], message: `calc id ${calc.id} is already used by the calc at ${firstId}` });
    else ids.set(calc.id, path);
    const firstLabel = labels.get(calc.label);
    if (firstLabel !== undefined) ctx.addIssue({ code: "custom", path: [...at, "attrs", "label"], message: `label ${calc.label} is already used by the calc at ${firstLabel}; each calc needs its own label` });
    else labels.set(calc.label, path);
  }
}

/** `content[2].content[0]` → ["content", 2, "content", 0]. */
function pathSegments(path: string): (string | number)[] {
  const out: (string | number)[] = [];
  for (const m of path.matchAll(/([A-Za-z_]+)|\[(\d+)\]/g)) out.push(m[1] ?? Number(m[2]));
  return out;
}
