import type { IndexEntry } from "../../../templates/index-section";
import type { ReportModel } from "../report-model";

/** What the index lists, in sheet order: the parts, the numbered headings (levels 1–2) and every calc. */
export function indexEntries(model: ReportModel): IndexEntry[] {
  const out: IndexEntry[] = [
    { title: "Design criteria summary", level: 0, anchor: "criteria" },
    { title: "Revision log", level: 0, anchor: "revisions" },
    { title: "Calculations", level: 0, anchor: "narrative" },
  ];
  for (const b of model.narrative) {
    if (b.type === "heading" && b.level <= 2) out.push({ title: `${b.number}  ${b.text}`, level: b.level === 1 ? 1 : 2, anchor: b.anchor });
    if (b.type === "calc") out.push({ title: `${b.calc.label}  ${b.calc.kindName}${b.calc.title !== b.calc.kindName ? ` — ${b.calc.title}` : ""}`, level: 3, anchor: `calc-${b.calc.label}` });
  }
  out.push({ title: "Check record", level: 0, anchor: "check-record" });
  if (model.responseLetter) out.push({ title: "Response to plan-review comments", level: 0, anchor: "response-letter" });
  model.appendices.forEach((a, i) => out.push({ title: `Appendix ${String.fromCharCode(65 + (i % 26))} — ${a.title}`, level: 0, anchor: `appendix-${i + 1}` }));
  return out;
}
