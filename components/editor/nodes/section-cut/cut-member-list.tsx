"use client";

import { MAX_CUT_MEMBERS } from "./toggle-cut-member";

export type CutMemberListProps = {
  members: readonly string[];
  cut: readonly string[];
  readOnly: boolean;
  onToggle: (member: string) => void;
};

/** The members as a list of checkboxes: the keyboard and screen-reader way to pick the cut, beside clicking the diagram. */
export function CutMemberList({ members, cut, readOnly, onToggle }: CutMemberListProps) {
  return (
    <fieldset className="min-w-0">
      <legend className="pp-label">Members cut ({cut.length} of {MAX_CUT_MEMBERS} at most)</legend>
      <div className="flex max-h-32 flex-wrap gap-x-3 gap-y-1 overflow-y-auto text-sm">
        {members.map((m) => (
          <label key={m} className="inline-flex items-center gap-1">
            <input type="checkbox" checked={cut.includes(m)} disabled={readOnly} onChange={() => onToggle(m)} />
            <span className="pp-num">{m}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
