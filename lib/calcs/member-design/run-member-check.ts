import { checkMember, type CheckMemberResult } from "../../solve";
import type { DesignUnits } from "./design-units";
import type { MemberDesignInputs } from "./member-design-inputs";

/** Runs the core's axial check for row `i` at one force and length, both in design units. */
export function runMemberCheck(inputs: MemberDesignInputs, i: number, force: number, length: number, units: DesignUnits): CheckMemberResult {
  const common = { force, length, units: units.system };
  switch (inputs.material) {
    case "steel-aisc360": {
      const r = inputs.members[i];
      return checkMember({ ...common, material: "steel-aisc360", section: r.section, K: r.K, Fy: r.Fy, Fu: r.Fu, E: r.E, An: r.An, U: r.U, method: r.method });
    }
    case "steel-en1993": {
      const r = inputs.members[i];
      return checkMember({
        ...common, material: "steel-en1993", section: r.section, K: r.K, fy: r.fy, fu: r.fu, E: r.E, Anet: r.Anet, curve: r.curve,
        gammaM0: r.gammaM0, gammaM1: r.gammaM1, gammaM2: r.gammaM2,
      });
    }
    case "timber-nds": {
      const r = inputs.members[i];
      return checkMember({ ...common, material: "timber-nds", section: r.section, K: r.K, FcStar: r.FcStar, FtPrime: r.FtPrime, EminPrime: r.EminPrime, c: r.c, An: r.An });
    }
  }
}
