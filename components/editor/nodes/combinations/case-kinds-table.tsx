"use client";

import { defaultPsi0 } from "@/lib/solve";
import { NumberField } from "./number-field";

export type CaseKindsTableProps = {
  trussLabel: string;
  cases: readonly { id: string; kind: string }[];
  /** Kinds the chosen set combines; null for custom factors. */
  combined: readonly string[] | null;
  setName: string;
  /** ψ0 per case id when the set uses it (EN 1990), else undefined. */
  psi0?: Readonly<Record<string, number>>;
  onPsi0?: (caseId: string, value: number | undefined) => void;
  readOnly: boolean;
};

/**
 * The truss's load cases with the kind each is combined as. Kinds are set in
 * the Truss calc, so here they are shown, not edited; a kind the set does not
 * combine is flagged before the calc refuses it.
 */
export function CaseKindsTable({ trussLabel, cases, combined, setName, psi0, onPsi0, readOnly }: CaseKindsTableProps) {
  if (cases.length === 0) return <p className="text-sm text-ink-faint">{trussLabel || "The truss"} has no load cases to combine yet.</p>;
  return (
    <table className="pp-table" aria-label={`Load cases of ${trussLabel}`}>
      <thead>
        <tr>
          <th scope="col">Load case</th>
          <th scope="col">Kind (set in {trussLabel})</th>
          <th scope="col">Combined</th>
          {psi0 && <th scope="col" className="normal-case">ψ₀ (EN 1990 Table A1.1)</th>}
        </tr>
      </thead>
      <tbody>
        {cases.map((c) => {
          const fits = combined === null || combined.includes(c.kind);
          const defaultPsi: number | undefined = c.kind === "Q" || c.kind === "S" || c.kind === "W" ? defaultPsi0[c.kind] : undefined;
          return (
            <tr key={c.id}>
              <td className="pp-num">{c.id}</td>
              <td className="pp-num">{c.kind}</td>
              <td className={fits ? "text-ink-soft" : "text-compression"}>
                {fits ? "✓ yes" : `✕ not a kind ${setName} combines (${combined?.join(", ")}): change it in ${trussLabel} or use custom factors`}
              </td>
              {psi0 && (
                <td className="w-40">
                  {defaultPsi === undefined ? (
                    <span className="text-xs text-ink-faint">{c.kind === "G" ? "permanent: no ψ₀" : "—"}</span>
                  ) : (
                    <NumberField
                      label="ψ₀"
                      name={`ψ0 of load case ${c.id}`}
                      value={psi0[c.id]}
                      onChange={(v) => onPsi0?.(c.id, v)}
                      readOnly={readOnly}
                      blankMeans={String(defaultPsi)}
                    />
                  )}
                </td>
              )}
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
