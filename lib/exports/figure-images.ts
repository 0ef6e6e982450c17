import { figureKey } from "@/lib/figures/figure-key";
import { getObject } from "@/lib/storage/get-object";

/** Every figure src in a document (the figure node's attrs.src). */
function figureSrcs(node: unknown, out: Set<string>): Set<string> {
  if (!node || typeof node !== "object") return out;
  const n = node as { type?: unknown; attrs?: { src?: unknown }; content?: unknown };
  if (n.type === "figure" && typeof n.attrs?.src === "string") out.add(n.attrs.src);
  if (Array.isArray(n.content)) for (const child of n.content) figureSrcs(child, out);
  return out;
}

/**
 * The document's uploaded figures as data: URIs keyed by their src, read from
 * the file store under the export's own firm and package (a src naming any
 * other package is left out, so a document cannot pull in another's figure).
 */
export async function loadFigureImages({ firmId, packageId, document }: { firmId: string; packageId: string; document: unknown }): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  const own = new RegExp(`^/api/v1/packages/${packageId}/figures/([0-9a-f-]{36})$`, "i");
  for (const src of figureSrcs(document, new Set())) {
    const figureId = own.exec(src)?.[1];
    if (!figureId) continue;
    const obj = await getObject(figureKey(firmId, packageId, figureId));
    if (obj) out[src] = `data:${obj.contentType ?? "image/png"};base64,${obj.body.toString("base64")}`;
  }
  return out;
}
