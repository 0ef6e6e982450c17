import { describe, expect, it } from "vitest";
import { headingNumbers } from "@/components/editor/heading-numbers";
import { outlineOf } from "@/components/editor/document-outline";

const h = (level: number, text: string) => ({ type: "heading", attrs: { level }, content: [{ type: "text", text }] });

describe("heading numbers and the outline", () => {
  it("numbers headings 1, 1.1, 1.2, 2, 2.1 and restarts lower levels", () => {
    const doc = { type: "doc", content: [h(1, "Criteria"), h(2, "Codes"), h(2, "Loads"), { type: "paragraph" }, h(1, "Analysis"), h(2, "Truss")] };
    expect([...headingNumbers(doc).values()]).toEqual(["1", "1.1", "1.2", "2", "2.1"]);
  });

  it("lists headings with their numbers and calcs by label, in document order", () => {
    const doc = { type: "doc", content: [h(1, "Analysis"), { type: "truss", attrs: { id: "a", label: "T1", inputs: {} } }, { type: "formula", attrs: { id: "b", label: "F1", inputs: {} } }] };
    expect(outlineOf(doc).map((e) => e.text)).toEqual(["1 Analysis", "T1", "F1"]);
  });
});
