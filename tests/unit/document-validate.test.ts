import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { TrussInputs } from "@/lib/calcs/truss/truss-inputs";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import type { PackageDocument } from "@/lib/document/document-types";
import { validatePackageDocument } from "@/lib/document/validate-package-document";

/** The demo with one calc's inputs changed by `edit`; returns the document and the calc's index in it. */
function demoWith(label: keyof typeof demoCalcIds, edit: (inputs: Record<string, unknown>) => void): { doc: PackageDocument; at: number } {
  const doc = demoFootbridgeDocument();
  const at = (doc.content ?? []).findIndex((n) => "attrs" in n && n.attrs && "id" in n.attrs && n.attrs.id === demoCalcIds[label]);
  const node = doc.content?.[at] as { attrs: { inputs: Record<string, unknown> } };
  edit(node.attrs.inputs);
  return { doc, at };
}

describe("validatePackageDocument", () => {
  it("accepts the demo footbridge package with every calc computed", () => {
    const r = validatePackageDocument(demoFootbridgeDocument());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.calcs.map((c) => c.label)).toEqual(["T1", "C1", "S1", "J1", "F1", "M1", "D1"]);
    expect(new Set(r.calcs.map((c) => c.kind)).size).toBe(7);
    expect(Object.values(r.evaluation.results).every((c) => c.status === "ok" && c.messages.length === 0)).toBe(true);
    expect(r.notices).toEqual([]);
    expect(r.document).toEqual(demoFootbridgeDocument());
  });

  it("links every calc of the demo to the truss T1", () => {
    const r = validatePackageDocument(demoFootbridgeDocument());
    if (!r.ok) throw new Error(r.message);
    const inputs = r.calcs.filter((c) => c.kind !== "truss" && c.kind !== "formula").map((c) => (c.inputs as { truss: string }).truss);
    expect(inputs.every((t) => t === "T1")).toBe(true);
    const formula = r.calcs.find((c) => c.kind === "formula")?.inputs as { source: string };
    expect(formula.source).toContain("S1.F_U2U3");
    expect(formula.source).toContain("T1.F_U2U3_G");
  });

  it("accepts the document as JSON text", () => {
    expect(validatePackageDocument(JSON.stringify(demoFootbridgeDocument())).ok).toBe(true);
    expect(validatePackageDocument("{ not json").ok).toBe(false);
  });

  it("refuses a calc whose inputs do not compute, naming the calc and the field", () => {
    const { doc, at } = demoWith("T1", (inputs) => {
      (inputs as TrussInputs).members[3].end = "L9";
    });
    const r = validatePackageDocument(doc);
    expect(r).toEqual({
      ok: false,
      code: "INVALID",
      message: expect.stringMatching(/^Calc T1 \(Truss\) has invalid inputs at members\[3\]\.end: Member L3L4 ends at joint "L9"/),
      path: `content[${at}].attrs.inputs.members[3].end`,
    });
  });

  it("refuses a formula with a line that does not evaluate, on that line", () => {
    const { doc, at } = demoWith("F1", (inputs) => {
      inputs.source = "a = 2 m\nb = a +";
    });
    const r = validatePackageDocument(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.path).toBe(`content[${at}].attrs.inputs.source:line2`);
  });

  it("lets an unstable truss be saved mid-work, and reports it with the calcs waiting on it", () => {
    const { doc } = demoWith("T1", (inputs) => {
      const t = inputs as TrussInputs;
      t.members = t.members.filter((m) => m.id !== "U2L3");
    });
    const r = validatePackageDocument(doc);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.notices.map((n) => [n.label, n.status])).toEqual([
      ["T1", "error"],
      ["C1", "blocked"],
      ["S1", "blocked"],
      ["J1", "blocked"],
      ["F1", "blocked"],
      ["M1", "blocked"],
      ["D1", "blocked"],
    ]);
    expect(r.notices[0].messages[0]).toMatch(/unstable/i);
  });

  it("lets a broken reference be saved, and reports it", () => {
    const { doc } = demoWith("D1", (inputs) => {
      inputs.truss = "T9";
    });
    const r = validatePackageDocument(doc);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.notices).toEqual([{ id: demoCalcIds.D1, label: "D1", status: "error", messages: ["Broken reference: T9 is not in this package."] }]);
  });

  it("answers any junk with a clean refusal and never throws", () => {
    fc.assert(
      fc.property(fc.anything({ maxDepth: 6, withNullPrototype: true, withObjectString: true }), (junk) => {
        const r = validatePackageDocument(junk);
        expect(r.ok).toBe(false);
        if (!r.ok) {
          expect(r.code).toBe("INVALID");
          expect(typeof r.message).toBe("string");
          expect(r.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 400 },
    );
  });

  it("answers a damaged demo document with either acceptance or a clean refusal", () => {
    const base = demoFootbridgeDocument();
    const paths = leafPaths(base);
    fc.assert(
      fc.property(fc.constantFrom(...paths), fc.oneof(fc.anything({ maxDepth: 2 }), fc.constant(undefined)), (path, replacement) => {
        const doc = structuredClone(base) as unknown;
        setAt(doc, path, replacement);
        const r = validatePackageDocument(doc);
        if (!r.ok) {
          expect(r.code).toBe("INVALID");
          expect(r.message.length).toBeGreaterThan(0);
        } else {
          expect(Object.keys(r.evaluation.results)).toHaveLength(r.calcs.length);
        }
      }),
      { numRuns: 300 },
    );
  });
});

/** Paths to every value in a JSON tree, as key lists. */
function leafPaths(value: unknown, at: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  if (at.length > 0) out.push(at);
  if (Array.isArray(value)) value.forEach((v, i) => leafPaths(v, [...at, i], out));
  else if (typeof value === "object" && value !== null) for (const [k, v] of Object.entries(value)) leafPaths(v, [...at, k], out);
  return out;
}

function setAt(root: unknown, path: (string | number)[], replacement: unknown): void {
  let node = root as Record<string | number, unknown>;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  if (replacement === undefined && !Array.isArray(node)) delete node[last];
  else node[last] = replacement;
}
