import type { TrussInputs } from "@/lib/calcs/truss/truss-inputs";

/** A joint row as the table holds it: a cleared number cell is `undefined` until retyped. */
export type JointRow = { id: string; x?: number; y?: number };
/** A member row; A and E are optional in the model as well as while typing. */
export type MemberRow = { id: string; start: string; end: string; A?: number; E?: number };
/** A joint load row of one case. */
export type LoadRow = { joint: string; fx?: number; fy?: number };
export type SupportDraft = { joint: string; type: "pin" | "roller"; direction?: [number, number] };
export type LoadCaseDraft = { id: string; kind: string; loads: LoadRow[] };
export type LineLoadDraft = { case: string; chord: string[]; w?: number; projected?: boolean };

/**
 * A Truss calc's inputs as they may stand while the author types: the shape
 * of `TrussInputs`, but with numbers that may be missing. The runtime names
 * what is wrong on its field; the view still has to draw what is there.
 */
export type TrussDraft = {
  units: TrussInputs["units"];
  joints: JointRow[];
  members: MemberRow[];
  supports: SupportDraft[];
  loadCases: LoadCaseDraft[];
  lineLoads?: LineLoadDraft[];
  generator?: TrussInputs["generator"];
};

const text = (v: unknown): string => (typeof v === "string" ? v : typeof v === "number" ? String(v) : "");
const num = (v: unknown): number | undefined => (typeof v === "number" && Number.isFinite(v) ? v : undefined);
const list = (v: unknown): Record<string, unknown>[] => (Array.isArray(v) ? v.filter((x): x is Record<string, unknown> => typeof x === "object" && x !== null) : []);
const record = (v: unknown): Record<string, unknown> => (typeof v === "object" && v !== null && !Array.isArray(v) ? (v as Record<string, unknown>) : {});

/**
 * Reads whatever the node holds (a hand-edited or pasted document may hold
 * anything) into the draft shape, keeping every value that fits and
 * dropping what cannot be shown; the runtime reports the original problem.
 */
export function readTrussDraft(raw: unknown): TrussDraft {
  const o = record(raw);
  const units = record(o.units);
  const draft: TrussDraft = {
    units: { length: units.length === "ft" ? "ft" : "m", force: units.force === "kip" ? "kip" : "kN" },
    joints: list(o.joints).map((j) => ({ id: text(j.id), x: num(j.x), y: num(j.y) })),
    members: list(o.members).map((m) => ({ id: text(m.id), start: text(m.start), end: text(m.end), A: num(m.A), E: num(m.E) })),
    supports: list(o.supports).map((s) => {
      const d = Array.isArray(s.direction) && s.direction.length === 2 ? s.direction.map(Number) : null;
      return { joint: text(s.joint), type: s.type === "roller" ? "roller" : "pin", ...(d ? { direction: [d[0], d[1]] as [number, number] } : {}) };
    }),
    loadCases: list(o.loadCases).map((c) => ({
      id: text(c.id),
      kind: text(c.kind),
      loads: list(c.loads).map((l) => ({ joint: text(l.joint), fx: num(l.fx), fy: num(l.fy) })),
    })),
  };
  if (Array.isArray(o.lineLoads)) {
    draft.lineLoads = list(o.lineLoads).map((l) => ({
      case: text(l.case),
      chord: Array.isArray(l.chord) ? l.chord.map(text) : [],
      w: num(l.w),
      ...(typeof l.projected === "boolean" ? { projected: l.projected } : {}),
    }));
  }
  // The generator record is only a memory of the form; an unreadable one is dropped rather than shown wrong.
  if (o.generator && typeof record(o.generator).shape === "string") draft.generator = o.generator as TrussInputs["generator"];
  return draft;
}
