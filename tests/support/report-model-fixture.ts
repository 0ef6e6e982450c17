import type { ReportCalc, ReportModel } from "@/lib/report/report-model";
import { SAFETY_TEXT } from "@/lib/safety-notice";
import { TINY_PNG } from "./tiny-png";

/**
 * A small, hand-built package as the exports see it: a 4-panel Pratt truss
 * (P = 100 kN at midspan, a = 3 m, h = 2.5 m), a section cut, a formula with
 * units, a document table, a list with an inline equation, a response letter.
 * Every equation is listed in `FIXTURE_EQUATIONS` so tests can count them.
 */
const DIAGRAM_SVG =
  '<svg viewBox="0 0 240 80" role="img" style="width:100%;height:auto;font-family:var(--font-ui), system-ui, sans-serif">' +
  '<line x1="10" y1="70" x2="230" y2="70" stroke="#222" stroke-width="2"/><line x1="10" y1="70" x2="65" y2="20" stroke="#222"/>' +
  '<line x1="65" y1="20" x2="175" y2="20" stroke="#222"/><line x1="175" y1="20" x2="230" y2="70" stroke="#222"/>' +
  '<text x="120" y="14" style="font-family:var(--font-num), ui-monospace, monospace">U2–U3</text></svg>';

const truss: ReportCalc = {
  id: "calc-t1",
  label: "T1",
  kind: "truss",
  kindName: "Truss",
  title: "Main truss, 12 m Pratt",
  status: "ok",
  inputs: [
    { caption: "Joints", header: ["Joint", "x (m)", "y (m)", "Support"], rows: [["L0", "0.000", "0.000", "pin"], ["L2", "6.000", "0.000", ""], ["L4", "12.000", "0.000", "roller"], ["U2", "6.000", "2.500", ""]], align: ["left", "right", "right", "left"] },
    { caption: "Loads, case D", header: ["Joint", "Fx (kN)", "Fy (kN)"], rows: [["L2", "0", "-100.0"]], align: ["left", "right", "right"] },
  ],
  diagramSvg: DIAGRAM_SVG,
  steps: [
    { latex: String.raw`\sum M_{L0} = 0:\; R_B \cdot 4a - P \cdot 2a = 0`, text: "Moments about the left support" },
    { latex: String.raw`R_A = \frac{P}{2} = 50\,\mathrm{kN}` },
  ],
  results: [
    { name: "R_A", tex: "R_{A}", value: "50.00", unit: "kN" },
    { name: "R_B", tex: "R_{B}", value: "50.00", unit: "kN" },
  ],
  messages: [],
  revised: true,
};

const cut: ReportCalc = {
  id: "calc-s1",
  label: "S1",
  kind: "sectionCut",
  kindName: "Section cut",
  title: "Section cut",
  status: "ok",
  inputs: [{ caption: "Cut", header: ["Member", "Cut"], rows: [["U2U3", "yes"], ["L2L3", "yes"], ["U2L3", "yes"]] }],
  diagramSvg: null,
  steps: [
    { latex: String.raw`\sum M_{L2} = 0:\; F_{U2U3}\cdot h + R_A \cdot 2a = 0`, text: "Pivot at L2, where two cut members meet" },
    { latex: String.raw`F_{U2U3} = -\frac{R_A \cdot 2a}{h} = -\frac{50 \cdot 6}{2.5} = -120\,\mathrm{kN}` },
  ],
  results: [{ name: "F_U2U3", tex: "F_{U2U3}", value: "-120.0", unit: "kN" }],
  messages: [],
  revised: false,
};

const formula: ReportCalc = {
  id: "calc-f1",
  label: "F1",
  kind: "formula",
  kindName: "Formula",
  title: "Top chord stress",
  status: "ok",
  inputs: [{ caption: "Formula", header: ["Line"], rows: [["A = 2000 mm^2"], ["sigma = S1.F_U2U3 / A -> MPa"]] }],
  diagramSvg: null,
  steps: [
    { latex: String.raw`A = 2000\,\mathrm{mm^2}` },
    { latex: String.raw`\sigma = \frac{F_{U2U3}}{A} = \frac{-120\,\mathrm{kN}}{2000\,\mathrm{mm^2}} = -60.0\,\mathrm{MPa}` },
  ],
  results: [{ name: "sigma", tex: String.raw`\sigma`, value: "-60.00", unit: "MPa" }],
  messages: [],
  revised: false,
};

export const FIXTURE_CALCS = [truss, cut, formula];

/** Inline equations in the narrative (math runs). */
const INLINE_MATH = [String.raw`P = 100\,\mathrm{kN}`, String.raw`a = 3\,\mathrm{m}`, String.raw`\phi_c = 0.9`];

export function issuedReportModel(): ReportModel {
  return {
    meta: {
      firmName: "Kestrel & Vane Engineering",
      projectName: "Alder Creek Footbridge",
      jobNumber: "KV-2026-014",
      client: "Alder Creek Parks Board",
      site: "Alder Creek trail crossing",
      paperSize: "letter",
      packageId: "pkg-fixture",
      packageTitle: "Main truss calculations",
      revision: { id: "rev-1", label: "1", number: 1, issuedAt: "2026-11-30T15:00:00Z", issuedBy: "Ines Marlow" },
      previousRevisionLabel: "0",
      fingerprint: "3f1c9a0d5be27e84c6a1f0b9d2e3c4a5b6c7d8e9f0a1b2c3d4e5f60718293a4b",
      preparedBy: { name: "Ines Marlow", date: "2026-11-28" },
      checkedBy: { name: "Tomas Reyne", date: "2026-11-29" },
      seal: { name: "Ines Marlow, P.E.", licenceNumber: "PE-40213", jurisdiction: "State of Oregon (fictional register)", expiresOn: "2027-12-31", imageDataUri: `data:image/png;base64,${TINY_PNG.toString("base64")}` },
      verification: { url: "https://panelpoint.example/verify/abc123", token: "abc123" },
      generatedAt: "2026-12-02T14:00:00Z",
      safetyText: SAFETY_TEXT,
    },
    criteria: {
      codes: [{ code: "AISC 360", edition: "2016", clauses: ["D2", "E3"] }],
      materials: [{ name: "ASTM A500 Gr. C", properties: "Fy = 345 MPa, E = 200 GPa", usedBy: ["T1"] }],
      loadCases: [{ id: "D", kind: "dead", description: "Self-weight and deck", usedBy: ["T1"] }],
      combinations: [{ name: "LRFD 2", expression: "1.2·D + 1.6·L", usedBy: ["T1"] }],
    },
    revisionLog: [
      { label: "0", date: "2026-11-10", by: "Ines Marlow", description: "Issued for plan review" },
      { label: "1", date: "2026-11-30", by: "Ines Marlow", description: "Responses to plan-review comments" },
    ],
    narrative: [
      { type: "heading", level: 1, number: "1", text: "Scope", anchor: "scope" },
      {
        type: "paragraph",
        runs: [
          { type: "text", text: "The main truss carries " },
          { type: "math", tex: INLINE_MATH[0] },
          { type: "text", text: " at midspan with panels of " },
          { type: "math", tex: INLINE_MATH[1] },
          { type: "text", text: ". Checks follow " },
          { type: "text", text: "AISC 360-16", italic: true },
          { type: "text", text: "; see " },
          { type: "text", text: "section 2", href: "#section-cut" },
          { type: "text", text: " and " },
          { type: "text", text: "T1.R_A", code: true },
          { type: "text", text: ". Units: mm" },
          { type: "text", text: "2", sup: true },
          { type: "break" },
          { type: "text", text: "Drawings: ", bold: true },
          { type: "text", text: "sheet S-101", href: "https://example.com/drawings/S-101" },
        ],
      },
      {
        type: "list",
        ordered: true,
        start: 1,
        items: [
          [{ type: "paragraph", runs: [{ type: "text", text: "Resistance factor " }, { type: "math", tex: INLINE_MATH[2] }] }],
          [{ type: "paragraph", runs: [{ type: "text", text: "Deflection limit L/360" }] }],
        ],
      },
      { type: "calc", calc: truss },
      { type: "heading", level: 2, number: "1.1", text: "Member schedule", anchor: "member-schedule" },
      {
        type: "table",
        header: [[{ type: "text", text: "Member" }], [{ type: "text", text: "Section" }]],
        rows: [
          [[{ type: "text", text: "Top chord" }], [{ type: "text", text: "HSS 152×152×9.5" }]],
          [[{ type: "text", text: "Bottom chord" }], [{ type: "text", text: "HSS 152×102×8.0" }]],
        ],
      },
      { type: "figure", image: { dataUri: `data:image/png;base64,${TINY_PNG.toString("base64")}`, width: 120 }, caption: "Figure 1. Site sketch", alt: "Site sketch" },
      { type: "heading", level: 1, number: "2", text: "Section cut", anchor: "section-cut" },
      { type: "calc", calc: cut },
      { type: "quote", blocks: [{ type: "paragraph", runs: [{ type: "text", text: "Reviewer: show the cut through panel 3." }] }] },
      { type: "rule" },
      { type: "calc", calc: formula },
    ],
    checkRecord: [
      { calcLabel: "T1", calcTitle: "Main truss, 12 m Pratt", checker: "Tomas Reyne", checkedAt: "2026-11-29T10:00:00Z", state: "checked" },
      { calcLabel: "S1", calcTitle: "Section cut", checker: "Tomas Reyne", checkedAt: "2026-11-29T10:30:00Z", state: "checked" },
      { calcLabel: "F1", calcTitle: "Top chord stress", checker: null, checkedAt: null, state: "unchecked" },
    ],
    responseLetter: {
      answersRevisionLabel: "0",
      reviewer: "City of Alder Creek plan review",
      date: "2026-11-20",
      comments: [{ number: "1", text: "Show the top chord force by a section cut.", response: "Added calc S1, pivot at L2.", answeredIn: ["S1", "2 Section cut"] }],
    },
    appendices: [
      {
        title: "Member forces, T1",
        calcLabel: "T1",
        tables: [{ caption: "Case D", header: ["Member", "N (kN)"], rows: Array.from({ length: 60 }, (_, i) => [`M${i + 1}`, (i * 1.5 - 40).toFixed(2)]), align: ["left", "right"] }],
      },
    ],
    changedCalcIds: ["calc-t1"],
  };
}

/** The same package as an unissued draft: no revision, no seal, no verification link. */
export function draftReportModel(): ReportModel {
  const model = issuedReportModel();
  return {
    ...model,
    meta: { ...model.meta, revision: null, seal: null, verification: null, checkedBy: null },
    responseLetter: null,
    changedCalcIds: [],
  };
}

/** Every equation a renderer must typeset in a model: steps, results and inline math runs. */
export function equationsIn(model: ReportModel): string[] {
  const out: string[] = [];
  const walk = (blocks: ReportModel["narrative"]) => {
    for (const block of blocks) {
      if (block.type === "paragraph") out.push(...block.runs.flatMap((r) => (r.type === "math" ? [r.tex] : [])));
      else if (block.type === "list") block.items.forEach(walk);
      else if (block.type === "quote") walk(block.blocks);
      else if (block.type === "table") for (const row of [...(block.header ? [block.header] : []), ...block.rows]) for (const cell of row) out.push(...cell.flatMap((r) => (r.type === "math" ? [r.tex] : [])));
      else if (block.type === "calc") {
        out.push(...block.calc.steps.map((s) => s.latex));
        if (block.calc.status === "ok") out.push(...block.calc.results.map((r) => r.tex));
      }
    }
  };
  walk(model.narrative);
  return out;
}
