import type { CalcKind } from "../calcs/calc-types";
import type { Step } from "../solve";

/**
 * The calculation package as the exports see it: everything the HTML/PDF and
 * the DOCX renderers need, already derived (numbers formatted, headings
 * numbered, calcs recomputed by the server). Both renderers read only this,
 * so the two files cannot disagree about content. JSON-serializable.
 */
export type ReportModel = {
  meta: ReportMeta;
  /** Design criteria drawn from the calcs and the standard references in the text. */
  criteria: DesignCriteria;
  /** Oldest first; the revision being exported is the last row (or a "draft" row). */
  revisionLog: RevisionLogRow[];
  /** The narrative in document order, calcs included. */
  narrative: ReportBlock[];
  /** Who checked which calc, when. */
  checkRecord: CheckRecordRow[];
  /** The plan-review response letter that travels with this revision, when there is one. */
  responseLetter: ResponseLetter | null;
  /** Full member-force tables, one appendix per truss-bearing calc. */
  appendices: ReportAppendix[];
  /**
   * Calc ids whose inputs or results changed since the previous revision; their
   * sheets carry the revision mark. Empty for a first revision or a draft without one.
   */
  changedCalcIds: string[];
};

export type PaperSize = "letter" | "a4";

export type ReportMeta = {
  firmName: string;
  projectName: string;
  jobNumber: string;
  client: string | null;
  site: string | null;
  paperSize: PaperSize;
  packageId: string;
  packageTitle: string;
  /** The issued revision exported, or null for a draft (which prints PRELIMINARY — NOT FOR CONSTRUCTION). */
  revision: { id: string; label: string; number: number; issuedAt: string; issuedBy: string } | null;
  /** Label of the revision before this one, for "revised since Rev …" marks; null when none. */
  previousRevisionLabel: string | null;
  /** SHA-256 (hex) of the canonical package content: the revision's stored fingerprint, or the draft's computed one. */
  fingerprint: string;
  /** By/date and checked/date of the title block. */
  preparedBy: { name: string; date: string };
  checkedBy: { name: string; date: string } | null;
  /** The engineer of record's seal, frozen in the revision; null for drafts or when none is on file. */
  seal: ReportSeal | null;
  /** Where the signed file can be verified (issued exports only). */
  verification: { url: string; token: string } | null;
  /** When this export was assembled (ISO 8601). */
  generatedAt: string;
  /** The cautions printed on the cover and in every footer (lib/safety-notice.ts). */
  safetyText: string;
};

export type ReportSeal = {
  name: string;
  licenceNumber: string;
  jurisdiction: string;
  /** ISO date (YYYY-MM-DD). */
  expiresOn: string;
  /** The sanitized seal image as a data: URI (PNG or SVG), or null when the profile has none. */
  imageDataUri: string | null;
};

export type DesignCriteria = {
  /** Codes and standards with their editions, from standard references and calc inputs. */
  codes: { code: string; edition: string; clauses: string[] }[];
  /** Materials named by member-design and truss calcs (e.g. "S355, E = 210 GPa"). */
  materials: { name: string; properties: string; usedBy: string[] }[];
  loadCases: { id: string; kind: string; description: string; usedBy: string[] }[];
  combinations: { name: string; expression: string; usedBy: string[] }[];
};

export type RevisionLogRow = { label: string; date: string; by: string; description: string };

export type CheckRecordRow = { calcLabel: string; calcTitle: string; checker: string | null; checkedAt: string | null; state: "checked" | "returned" | "unchecked" };

export type ResponseLetter = {
  /** The revision whose plan-review comments are answered (e.g. "0"). */
  answersRevisionLabel: string;
  reviewer: string | null;
  date: string | null;
  comments: {
    number: string;
    text: string;
    response: string;
    /** Where in this revision it is answered: calc labels and/or numbered headings, e.g. ["S1", "3.2 Section cut"]. */
    answeredIn: string[];
  }[];
};

export type ReportAppendix = { title: string; calcLabel: string; tables: ReportTable[] };

/** A run of inline content. Math is TeX, typeset by KaTeX (HTML) or converted to OMML (DOCX). */
export type ReportRun =
  | { type: "text"; text: string; bold?: boolean; italic?: boolean; code?: boolean; sub?: boolean; sup?: boolean; href?: string }
  | { type: "math"; tex: string }
  | { type: "break" };

export type ReportTable = {
  caption: string | null;
  header: string[];
  rows: string[][];
  /** Column alignment; numbers are right-aligned. Defaults to left. */
  align?: ("left" | "right" | "center")[];
};

export type ReportBlock =
  | { type: "heading"; level: 1 | 2 | 3 | 4; number: string; text: string; anchor: string }
  | { type: "paragraph"; runs: ReportRun[] }
  | { type: "list"; ordered: boolean; start: number; items: ReportBlock[][] }
  | { type: "quote"; blocks: ReportBlock[] }
  | { type: "rule" }
  | { type: "pageBreak" }
  | { type: "figure"; image: { dataUri: string; width?: number; height?: number } | null; caption: string | null; alt: string | null }
  | { type: "table"; header: ReportRun[][] | null; rows: ReportRun[][][] }
  | { type: "calc"; calc: ReportCalc };

export type ReportCalc = {
  id: string;
  label: string;
  kind: CalcKind;
  /** "Truss", "Section cut", … */
  kindName: string;
  /** The calc's own title when it has one, else its kind name. */
  title: string;
  status: "ok" | "error" | "blocked";
  /** The inputs as tables (geometry, members, loads, parameters…). */
  inputs: ReportTable[];
  /** The same SVG the editor draws (static markup), or null for kinds without a diagram. */
  diagramSvg: string | null;
  /** Typeset working, in order. */
  steps: Step[];
  /** The governing values the calc exports, formatted. */
  results: { name: string; tex: string; value: string; unit: string }[];
  /** Problems and notes (unstable truss, broken reference…), printed in place of results when status is not ok. */
  messages: string[];
  /** Changed since the previous revision (prints the revision mark). */
  revised: boolean;
};
