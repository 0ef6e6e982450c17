"use client";

import type { SelectOption } from "@/components/editor/input-table/input-column";
import type { CalcFieldError } from "@/lib/calcs/calc-types";
import { fieldErrorAt } from "../combinations/field-error-at";
import { SelectField } from "../combinations/select-field";
import { materialOptions, readMaterial, type DesignMaterial } from "./material-choices";

export type MemberDesignControlsProps = {
  truss: string;
  source: string;
  material: DesignMaterial;
  trussOptions: readonly SelectOption[];
  sourceOptions: readonly SelectOption[];
  errors: readonly CalcFieldError[];
  readOnly: boolean;
  onTruss: (truss: string) => void;
  onSource: (source: string) => void;
  onMaterial: (material: DesignMaterial) => void;
};

/** What the members are checked for: the truss, where the forces come from, and the material with its standard. */
export function MemberDesignControls(p: MemberDesignControlsProps) {
  return (
    <div className="grid gap-3 sm:grid-cols-[10rem_1fr_1fr]">
      <SelectField label="Truss calc" value={p.truss} options={p.trussOptions} onChange={p.onTruss} readOnly={p.readOnly} error={fieldErrorAt(p.errors, "truss")} />
      <SelectField
        label="Forces from"
        value={p.source}
        options={p.sourceOptions}
        onChange={p.onSource}
        readOnly={p.readOnly}
        error={fieldErrorAt(p.errors, "source")}
        hint="A Combinations calc checks each member for its governing tension and compression."
      />
      <SelectField
        label="Material and standard"
        value={p.material}
        options={materialOptions}
        onChange={(m) => p.onMaterial(readMaterial(m))}
        readOnly={p.readOnly}
        error={fieldErrorAt(p.errors, "material")}
        hint={p.readOnly ? undefined : "Changing it resets each member's strengths to the new standard's starting values."}
      />
    </div>
  );
}
