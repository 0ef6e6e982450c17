import type { DbOrTrx } from "@/db/knex";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { hashCalcInputs } from "./hash-calc-inputs";

/** One calc's review state as it stands now. */
export type CalcCheckState = {
  calcId: string;
  label: string;
  state: "unchecked" | "checked" | "returned";
  checkerId: string | null;
  checkerName: string | null;
  at: Date | null;
  inputsHash: string;
  /** True when a mark was set but the calc's inputs changed since, which cleared it. */
  cleared: boolean;
};

export type CheckProgress = {
  /** m: calcs in the package. */
  total: number;
  /** n: calcs whose mark is "checked" and still matches their inputs. */
  checked: number;
  /** Remarks not yet closed (open or answered), detached ones included. */
  openRemarks: number;
  calcs: CalcCheckState[];
  /** Every calc checked and no remark left open: the package may be checked and issued. */
  complete: boolean;
};

export type ComputeCheckProgressOptions = { packageId: string; document: unknown; trx: DbOrTrx };

/**
 * Check progress of a package whose access the caller has already resolved.
 * A mark counts only while the calc's current inputs hash to the stored value,
 * so an input change clears it without anyone having to remember to.
 */
export async function computeCheckProgress({ packageId, document, trx }: ComputeCheckProgressOptions): Promise<CheckProgress> {
  const marks: { calcId: string; state: "checked" | "returned"; checker: string; checkerName: string; at: Date; inputsHash: string }[] = await trx
    .from("calcChecks as c")
    .join("users as u", "u.id", "c.checker")
    .select("c.calcId", "c.state", "c.checker", "u.name as checkerName", "c.at", "c.inputsHash")
    .where("c.packageId", packageId);
  const byCalc = new Map(marks.map((m) => [m.calcId, m]));
  const calcs = extractCalcs(document).map((calc): CalcCheckState => {
    const inputsHash = hashCalcInputs({ inputs: calc.inputs });
    const mark = byCalc.get(calc.id);
    const holds = mark !== undefined && mark.inputsHash === inputsHash;
    return {
      calcId: calc.id,
      label: calc.label,
      state: holds ? mark.state : "unchecked",
      checkerId: holds ? mark.checker : null,
      checkerName: holds ? mark.checkerName : null,
      at: holds ? mark.at : null,
      inputsHash,
      cleared: mark !== undefined && !holds,
    };
  });
  const [{ count }] = await trx.from("remarks").where({ packageId }).whereNot({ state: "closed" }).count<{ count: string }[]>({ count: "*" });
  const checked = calcs.filter((c) => c.state === "checked").length;
  const openRemarks = Number(count);
  return { total: calcs.length, checked, openRemarks, calcs, complete: checked === calcs.length && openRemarks === 0 };
}
