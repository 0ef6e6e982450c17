"use client";

import { useId } from "react";

export type KeepSidePickerProps = {
  joints: readonly string[];
  keep: string;
  /** The free body's joints, when the cut has been worked. */
  keptJoints: readonly string[];
  readOnly: boolean;
  onKeep: (joint: string) => void;
};

/** The side kept as the free body, named by any joint on it, with a one-click swap to the other side. */
export function KeepSidePicker({ joints, keep, keptJoints, readOnly, onKeep }: KeepSidePickerProps) {
  const id = useId();
  const other = keptJoints.length > 0 ? joints.find((j) => !keptJoints.includes(j)) : undefined;
  return (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      <label htmlFor={id} className="pp-label mb-0">Keep the side with joint</label>
      <select id={id} className="pp-input w-auto py-0.5" value={keep} disabled={readOnly} onChange={(e) => onKeep(e.target.value)}>
        {!joints.includes(keep) && <option value={keep}>{keep || "—"}</option>}
        {joints.map((j) => <option key={j} value={j}>{j}</option>)}
      </select>
      {keptJoints.length > 0 && <span className="text-ink-soft">free body: <span className="pp-num">{keptJoints.join(", ")}</span></span>}
      {!readOnly && other && (
        <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" onClick={() => onKeep(other)}>
          Keep the other side
        </button>
      )}
    </div>
  );
}
