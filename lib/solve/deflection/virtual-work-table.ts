import { escapeTex, texNum, texUnit } from "../latex";
import type { ModelUnits } from "../geometry/types";
import type { Step } from "../types";

/** One member's share of the virtual-work sum. */
export type VirtualWorkTerm = {
  member: string;
  /** Real force, load case, tension positive. */
  N: number;
  /** Force from the unit virtual load (force per unit load). */
  n: number;
  L: number;
  A: number;
  E: number;
  /** N·n·L/(A·E), in the length unit. */
  contribution: number;
};

/** The virtual-work table as one typeset array, one row per member, so the sum can be checked line by line. */
export function virtualWorkTable(terms: VirtualWorkTerm[], units: ModelUnits): Step {
  const u = (s: string) => `\\mathrm{${texUnit(s)}}`;
  const head = [
    "\\text{Member}", `N\\ (${u(units.force)})`, "n", `L\\ (${u(units.length)})`, `A\\ (${u(`${units.length}^2`)})`,
    `E\\ (${u(`${units.force}/${units.length}^2`)})`, `\\tfrac{N\\,n\\,L}{A\\,E}\\ (${u(units.length)})`,
  ].join(" & ");
  const rows = terms.map((t) =>
    [`\\mathrm{${escapeTex(t.member)}}`, texNum(t.N), texNum(t.n), texNum(t.L), texNum(t.A), texNum(t.E), texNum(t.contribution)].join(" & "),
  );
  return {
    latex: `\\begin{array}{lrrrrrr} ${head} \\\\ \\hline ${rows.join(" \\\\ ")} \\end{array}`,
    text: `Virtual-work table: for each member the real force N, the unit-load force n, length L, area A, modulus E and N·n·L/(A·E).`,
  };
}
