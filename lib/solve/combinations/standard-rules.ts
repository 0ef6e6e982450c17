import { asceFactorRules } from "./asce-factor-rules";
import type { AsceTable } from "./asce-template";
import { asce716Asd } from "./asce7-16-asd";
import { asce716Lrfd } from "./asce7-16-lrfd";
import { asce722Lrfd } from "./asce7-22-lrfd";
import { en1990FactorRules } from "./en1990-factor-rules";
import type { FactorRule, LoadAction, LoadStandard } from "./types";

/** The rules of a standard for these actions, with what to say about them in the steps. */
export type StandardRules = {
  title: string;
  kinds: readonly string[];
  permanentKind: string;
  rules: FactorRule[];
  /** What the set leaves out, and factors recalled rather than checked. */
  notes: string[];
};

const ASCE_KINDS = ["D", "L", "Lr", "S", "R", "W"] as const;
const EN_KINDS = ["G", "Q", "S", "W"] as const;
const ASCE_TABLES: Record<"ASCE7-16-LRFD" | "ASCE7-22-LRFD" | "ASCE7-16-ASD", AsceTable> = {
  "ASCE7-16-LRFD": asce716Lrfd,
  "ASCE7-22-LRFD": asce722Lrfd,
  "ASCE7-16-ASD": asce716Asd,
};

/** The action kinds a standard accepts. */
export function standardKinds(standard: LoadStandard): readonly string[] {
  return standard.startsWith("EN") ? EN_KINDS : ASCE_KINDS;
}

/** Factor rules of a published set for the given actions (kinds already validated). */
export function standardRules(standard: LoadStandard, actions: LoadAction[]): StandardRules {
  if (standard === "EN1990-6.10" || standard === "EN1990-6.10ab") {
    const variant = standard === "EN1990-6.10" ? "6.10" : "6.10ab";
    return {
      title: `EN 1990:2002 ${variant === "6.10" ? "Eq. 6.10" : "Eq. 6.10a and 6.10b"}, set B (Table A1.2(B)), persistent and transient situations`,
      kinds: EN_KINDS,
      permanentKind: "G",
      rules: en1990FactorRules(variant, actions),
      notes: [
        "Accidental and seismic design situations (Eq. 6.11, 6.12) and sets A and C are not generated; recommended factors of Table A1.2(B) and \u03c8 of Table A1.1 (a National Annex may set others).",
      ],
    };
  }
  const table = ASCE_TABLES[standard];
  const memory = [...new Set(table.templates.flatMap((t) => (t.fromMemory ? [t.fromMemory] : [])))];
  return {
    title: `${table.clause}: ${table.title}`,
    kinds: ASCE_KINDS,
    permanentKind: "D",
    rules: asceFactorRules(table, actions),
    notes: [table.omitted, ...memory.filter((m) => !table.omitted.includes(m))],
  };
}
