"use client";

import type { JSONContent } from "@tiptap/core";
import { calcKinds, type CalcKind } from "@/lib/calcs/calc-types";
import { headingNumbers } from "./heading-numbers";

export type OutlineEntry = { kind: "heading" | "calc"; level: number; text: string; index: number; status?: string };

/** Headings (numbered as in the package) and calcs in document order. */
export function outlineOf(doc: JSONContent): OutlineEntry[] {
  const out: OutlineEntry[] = [];
  const numbers = headingNumbers(doc);
  (doc.content ?? []).forEach((node, index) => {
    if (node.type === "heading") {
      const level = Number(node.attrs?.level ?? 1);
      const text = (node.content ?? []).map((c) => c.text ?? "").join("");
      out.push({ kind: "heading", level, text: `${numbers.get(index) ?? ""} ${text}`.trim(), index });
    } else if (calcKinds.includes(node.type as CalcKind)) {
      out.push({ kind: "calc", level: 9, text: String(node.attrs?.label ?? "?"), index });
    }
  });
  return out;
}

export function DocumentOutline({ doc, statusOf, onJump }: { doc: JSONContent; statusOf: (index: number) => string | undefined; onJump: (index: number) => void }) {
  const entries = outlineOf(doc);
  return (
    <nav aria-label="Outline" className="text-sm">
      <h2 className="pp-label">Outline</h2>
      {entries.length === 0 && <p className="text-xs text-ink-faint">Headings and calcs appear here.</p>}
      <ol className="space-y-0.5">
        {entries.map((e) => (
          <li key={`${e.kind}-${e.index}`} style={{ paddingLeft: e.kind === "calc" ? "1.25rem" : `${(e.level - 1) * 0.75}rem` }}>
            <button type="button" className="text-left hover:underline" onClick={() => onJump(e.index)}>
              {e.kind === "calc" ? <span className="pp-num text-xs">{e.text}</span> : e.text}
              {e.kind === "calc" && statusOf(e.index) && statusOf(e.index) !== "ok" && <span className="ml-1 text-xs text-compression">({statusOf(e.index)})</span>}
            </button>
          </li>
        ))}
      </ol>
    </nav>
  );
}
