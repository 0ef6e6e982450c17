import { escapeTex } from "../latex";

/** The symbol of a member force in the working, e.g. F with subscript U1L2 (upright, since it is a label). */
export function forceSymbol(memberId: string): string {
  return `F_{\\mathrm{${escapeTex(memberId)}}}`;
}
