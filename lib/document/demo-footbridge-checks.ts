import type { MemberDesignInputs } from "../calcs/member-design/member-design-inputs";
import { demoSections } from "./demo-footbridge-truss";

const steel = { fy: 355, fu: 490, E: 210000, curve: "a" as const };

function shape(key: keyof typeof demoSections): MemberDesignInputs["members"][number]["section"] {
  const s = demoSections[key];
  return s.shape === "rhs" ? { shape: "rhs", b: s.b, h: s.h, t: s.t } : { shape: "chs", D: s.D, t: s.t };
}

/**
 * M1 of the demo: EN 1993-1-1 checks of the left half of T1 (the truss is
 * symmetric): top and bottom chords, the end post, the diagonals and the
 * verticals, S355 hot-finished hollow sections (buckling curve a), forces
 * from the EN 1990 combinations of C1.
 */
export function demoFootbridgeMemberDesign(): MemberDesignInputs {
  const row = (member: string, key: keyof typeof demoSections) => ({ member, section: shape(key), K: 1, ...steel });
  return {
    truss: "T1",
    source: "C1",
    material: "steel-en1993",
    members: [
      row("U1U2", "topChord"),
      row("U2U3", "topChord"),
      row("L1L2", "bottomChord"),
      row("L2L3", "bottomChord"),
      row("L0U1", "topChord"),
      row("U1L2", "diagonal"),
      row("U2L3", "diagonal"),
      row("U1L1", "vertical"),
      row("U2L2", "vertical"),
    ],
  };
}
