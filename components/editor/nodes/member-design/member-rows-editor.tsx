"use client";

import type { CalcFieldError } from "@/lib/calcs/calc-types";
import type { UnitSystem } from "@/lib/solve";
import { MemberRowEditor } from "./member-row-editor";
import { newMemberRow, updateRow, type MemberDesignForm } from "./member-rows";

export type MemberRowsEditorProps = {
  form: MemberDesignForm;
  trussMembers: readonly string[];
  system: UnitSystem;
  units: { length: string; stress: string };
  errors: readonly CalcFieldError[];
  readOnly: boolean;
  onChange: (form: MemberDesignForm) => void;
};

/** The members checked, one block each; a new one copies the last block, for the next member of the truss not yet listed. */
export function MemberRowsEditor({ form, trussMembers, system, units, errors, readOnly, onChange }: MemberRowsEditorProps) {
  const memberOptions = trussMembers.map((m) => ({ value: m, label: m }));
  const setRows = (members: MemberDesignForm["members"]) => onChange({ ...form, members });
  return (
    <section aria-label="Members checked">
      <h4 className="pp-label">
        Members checked <span className="normal-case tracking-normal text-ink-faint">(sections in {units.length}, strengths in {units.stress})</span>
      </h4>
      {form.members.length === 0 && <p className="text-sm text-ink-faint">No members listed yet.</p>}
      <ol className="space-y-2">
        {form.members.map((row, i) => (
          <MemberRowEditor
            // Keyed by position: the member id is itself editable.
            key={i}
            row={row}
            index={i}
            material={form.material}
            system={system}
            units={units}
            memberOptions={memberOptions}
            errors={errors}
            readOnly={readOnly}
            onChange={(next) => setRows(updateRow(form.members, i, () => next))}
            onRemove={() => setRows(form.members.filter((_, k) => k !== i))}
          />
        ))}
      </ol>
      {!readOnly && (
        <button type="button" className="pp-btn-quiet mt-2 px-2 py-1 text-xs" onClick={() => setRows([...form.members, newMemberRow(form, trussMembers, system)])}>
          + Add member
        </button>
      )}
    </section>
  );
}
