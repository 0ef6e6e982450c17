"use client";

import type { SelectOption } from "@/components/editor/input-table/input-column";
import type { CalcFieldError } from "@/lib/calcs/calc-types";
import type { UnitSystem } from "@/lib/solve";
import { fieldErrorAt } from "../combinations/field-error-at";
import { NumberField } from "../combinations/number-field";
import { SelectField } from "../combinations/select-field";
import type { DesignMaterial } from "./material-choices";
import { MaterialFields } from "./material-fields";
import { withShape, type MemberRow } from "./member-rows";
import { SectionFields } from "./section-fields";

export type MemberRowEditorProps = {
  row: MemberRow;
  index: number;
  material: DesignMaterial;
  system: UnitSystem;
  units: { length: string; stress: string };
  memberOptions: readonly SelectOption[];
  errors: readonly CalcFieldError[];
  readOnly: boolean;
  onChange: (row: MemberRow) => void;
  onRemove: () => void;
};

/** One member checked: which member, its section, its effective length factor and its material properties. */
export function MemberRowEditor({ row, index, material, system, units, memberOptions, errors, readOnly, onChange, onRemove }: MemberRowEditorProps) {
  const path = `members[${index}]`;
  const owner = row.member ? `member ${row.member}` : `row ${index + 1}`;
  const grid = "grid grid-cols-[repeat(auto-fill,minmax(6.5rem,1fr))] items-start gap-x-2 gap-y-1.5";
  return (
    <li className="rounded-sm border border-rule bg-white/40 p-2" aria-label={owner}>
      <div className={grid}>
        <SelectField
          label="Member"
          value={row.member}
          options={memberOptions}
          onChange={(member) => onChange({ ...row, member })}
          readOnly={readOnly}
          error={fieldErrorAt(errors, `${path}.member`)}
        />
        <SectionFields
          section={row.section}
          material={material}
          length={units.length}
          owner={owner}
          path={`${path}.section`}
          errors={errors}
          readOnly={readOnly}
          onShape={(shape) => onChange(withShape(row, shape, system))}
          onField={(key, value) => onChange({ ...row, section: { ...row.section, [key]: value } })}
        />
        <NumberField
          label="K"
          name="effective length factor K"
          owner={owner}
          value={typeof row.props.K === "number" ? row.props.K : undefined}
          onChange={(K) => onChange({ ...row, props: { ...row.props, K } })}
          readOnly={readOnly}
          error={fieldErrorAt(errors, `${path}.K`)}
          blankMeans="1.0, pinned"
        />
      </div>
      <div className={`${grid} mt-1.5 border-t border-dashed border-rule pt-1.5`}>
        <MaterialFields
          props={row.props}
          material={material}
          units={units}
          owner={owner}
          path={path}
          errors={errors}
          readOnly={readOnly}
          onField={(key, value) => onChange({ ...row, props: { ...row.props, [key]: value } })}
        />
      </div>
      {!readOnly && (
        <div className="mt-1.5 text-right">
          <button type="button" className="rounded-sm px-1.5 py-0.5 text-xs text-ink-faint hover:bg-compression-light hover:text-compression" onClick={onRemove}>
            Remove {owner}
          </button>
        </div>
      )}
    </li>
  );
}
