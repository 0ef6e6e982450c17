"use client";

import { useId } from "react";

export type JointModePickerProps = {
  sequence: boolean;
  joint: string;
  joints: readonly string[];
  readOnly: boolean;
  onChange: (next: { sequence: boolean; joint: string }) => void;
};

/** One joint, or every joint of the truss in a solvable order, and which joint. */
export function JointModePicker({ sequence, joint, joints, readOnly, onChange }: JointModePickerProps) {
  const id = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
      <legend className="sr-only">What to solve</legend>
      <label className="inline-flex items-center gap-1.5">
        <input type="radio" name={`${id}-mode`} checked={!sequence} disabled={readOnly} onChange={() => onChange({ sequence: false, joint: joint || joints[0] || "" })} />
        One joint
      </label>
      <select aria-label="Joint" className="pp-input w-auto py-0.5" value={joint} disabled={readOnly || sequence} onChange={(e) => onChange({ sequence: false, joint: e.target.value })}>
        {!joints.includes(joint) && <option value={joint}>{joint || "—"}</option>}
        {joints.map((j) => <option key={j} value={j}>{j}</option>)}
      </select>
      <label className="inline-flex items-center gap-1.5">
        <input type="radio" name={`${id}-mode`} checked={sequence} disabled={readOnly} onChange={() => onChange({ sequence: true, joint })} />
        Every joint, in a solvable order
      </label>
    </fieldset>
  );
}
