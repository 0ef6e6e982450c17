import type { CalcKind } from "../calcs/calc-types";
import { demoFootbridgeMemberDesign } from "./demo-footbridge-checks";
import { demoFootbridgeTruss } from "./demo-footbridge-truss";
import type { BlockNode, CalcDocNode, PackageDocument } from "./document-types";
import { bullets, heading, paragraph, standardRef, table, text } from "./prose-nodes";

/** Fixed ids, so the seed, the tests and remarks can name the demo's calcs. */
export const demoCalcIds = {
  T1: "a1de0014-0000-4000-8000-000000000001",
  C1: "a1de0014-0000-4000-8000-000000000002",
  S1: "a1de0014-0000-4000-8000-000000000003",
  J1: "a1de0014-0000-4000-8000-000000000004",
  F1: "a1de0014-0000-4000-8000-000000000005",
  M1: "a1de0014-0000-4000-8000-000000000006",
  D1: "a1de0014-0000-4000-8000-000000000007",
} as const;

function calc(kind: CalcKind, label: keyof typeof demoCalcIds, inputs: unknown): CalcDocNode {
  return { type: kind, attrs: { id: demoCalcIds[label], label, inputs } };
}

const caution = paragraph(
  text("Caution: ", "bold"),
  "results in this package must be verified by a qualified engineer; the governing local codes and the authority having jurisdiction prevail, and the software's checks cover only what they state.",
);

/**
 * The demo package "Main trusses — 24 m Pratt span" of the invented project
 * Alder Creek Footbridge (job KV-2026-014, Kestrel & Vane Engineering):
 * steel, EN codes, SI. Every calc kind appears and reads T1. All figures are
 * fictional demo assumptions, stated as such in the text.
 */
export function demoFootbridgeDocument(): PackageDocument {
  const content: BlockNode[] = [
    caution,
    heading(1, "Design criteria"),
    paragraph(
      "Alder Creek Footbridge (job KV-2026-014) carries pedestrians and cyclists over Alder Creek on a single 24 m span. Two steel Pratt trusses, 3 m deep, carry a 2.5 m wide deck on cross-beams at the bottom-chord panel points. This package covers the main trusses; the deck, cross-beams, bearings and foundations are in separate packages.",
    ),
    table(
      ["Item", "Criterion"],
      [
        [["Basis of design"], [standardRef("EN 1990", "2002", "6.4.3.2"), " — ULS combinations by Eq. 6.10, partial factors of Table A1.2(B)"]],
        [["Pedestrian load"], [standardRef("EN 1991-2", "2003", "5.3.2.1"), " — uniformly distributed load on the deck"]],
        [["Member resistance"], [standardRef("EN 1993-1-1", "2005", "6.2.3, 6.3.1"), " — tension and flexural buckling"]],
        [["Steel"], ["S355 hot-finished hollow sections: fy = 355 MPa, fu = 490 MPa, E = 210 GPa, buckling curve a"]],
        [["Geometry"], ["Span 24 m, depth 3 m, 6 panels of 4 m, inclined end posts"]],
        [["Deflection"], ["Live-load deflection at midspan not more than span/360 (the demo's criterion)"]],
      ],
    ),
    heading(1, "Loads"),
    paragraph("Loads per truss, applied as line loads on the bottom chord and lumped at the panel points by tributary length. The figures are invented for this demo:"),
    bullets(
      [text("G", "bold"), " — permanent: truss self-weight, cross-beams and deck, 3.0 kN/m per truss (demo assumption)."],
      [text("Q", "bold"), " — pedestrian: 5.0 kN/m² over a tributary width of 1.25 m, 6.25 kN/m per truss. 5.0 kN/m² is the upper bound of the range in ", standardRef("EN 1991-2", "2003", "5.3.2.1"), " and is taken here as the demo's assumption."],
    ),
    heading(1, "Analysis"),
    paragraph("T1 is the truss model: geometry from the Pratt generator, sections as in section 4, loads as above. Member forces and reactions are by the stiffness method, with the reactions also by global equilibrium."),
    calc("truss", "T1", demoFootbridgeTruss()),
    paragraph("C1 combines the cases for the ultimate limit state by ", standardRef("EN 1990", "2002", "Eq. 6.10"), " and finds the governing combination of each member force."),
    calc("combinations", "C1", { truss: "T1", standard: "EN1990-6.10" }),
    paragraph("As an independent check, S1 cuts the top chord, the diagonal and the bottom chord of the panel left of midspan under Q, and J1 balances the left support joint L0 under Q."),
    calc("sectionCut", "S1", { truss: "T1", loadCase: "Q", members: ["U2U3", "U2L3", "L2L3"], keep: "L0" }),
    calc("joint", "J1", { truss: "T1", loadCase: "Q", joint: "L0", sequence: false }),
    paragraph("F1 combines the section-cut force under Q with the force under G from T1 by Eq. 6.10 and gives the top-chord stress at midspan."),
    calc("formula", "F1", {
      source: [
        "# Top chord U2U3 at midspan, ULS by EN 1990 Eq. 6.10",
        "N_Q = S1.F_U2U3 # pedestrian load, by the section cut",
        "N_G = T1.F_U2U3_G # permanent load, from the truss",
        "N_Ed = 1.35 * N_G + 1.5 * N_Q",
        "A = 2865 mm^2 # SHS 120x120x6.3",
        "sigma_Ed = N_Ed / A -> MPa",
      ].join("\n"),
      preferredUnits: "SI",
    }),
    heading(1, "Member checks"),
    paragraph("M1 checks the left half of the truss (it is symmetric) for the governing tension and compression of C1; effective length factor K = 1.0 between panel points."),
    calc("memberDesign", "M1", demoFootbridgeMemberDesign()),
    heading(1, "Deflection"),
    paragraph("D1 finds the midspan deflection of joint L3 under the pedestrian load Q by virtual work, cross-checked against the stiffness solution, and compares it with span/360."),
    calc("deflection", "D1", { truss: "T1", loadCase: "Q", joint: "L3", direction: "y", limitRatio: 360 }),
    heading(1, "Conclusions"),
    paragraph("Every member checked in M1 has a utilization below 1.0 under the governing combination of C1, and the live-load deflection D1 is within span/360. The section cut S1 and the joint check J1 agree with the stiffness solution of T1."),
    caution,
  ];
  return { type: "doc", content };
}
