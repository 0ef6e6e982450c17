import { calcKindNames } from "@/lib/calcs/calc-kind-names";
import { calcKinds, type CalcKind } from "@/lib/calcs/calc-types";
import { blockText } from "@/lib/review/compare/narrative-blocks";

type Node = { type?: string; attrs?: Record<string, unknown>; content?: unknown };

const CALC_TYPES: ReadonlySet<string> = new Set(calcKinds);

/** One top-level block of a package, read-only and in plain text: enough to see what changed beside it. */
export function CompareBlock({ node }: { node: Node }) {
  const type = node.type ?? "";
  if (CALC_TYPES.has(type)) {
    return (
      <div className="rounded-sm border border-rule bg-paper-raised px-3 py-2 text-sm">
        <span className="pp-num font-semibold">{String(node.attrs?.label ?? "?")}</span>
        <span className="ml-2 text-ink-soft">{calcKindNames[type as CalcKind]}</span>
      </div>
    );
  }
  const text = blockText(node);
  if (type === "heading") return <h3 className="font-serif text-lg font-semibold">{text}</h3>;
  if (type === "bulletList" || type === "orderedList" || type === "table") {
    return (
      <div className="space-y-0.5 text-sm">
        {text.split("\n").map((line, i) => (
          <p key={i} className={type === "table" ? "pp-num text-xs" : undefined}>{line}</p>
        ))}
      </div>
    );
  }
  return <p className="whitespace-pre-line text-sm">{text}</p>;
}
