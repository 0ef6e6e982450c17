import type { JSONContent } from "@tiptap/core";
import { headingNumbers as numberHeadings } from "@/lib/document/heading-numbers";

/** Automatic heading numbers (1, 1.1, 1.1.1 …) by position of top-level heading nodes; the logic lives in lib/document so the exports number alike. */
export function headingNumbers(doc: JSONContent): Map<number, string> {
  return numberHeadings(doc);
}
