"use client";

import type { CalcFieldError } from "@/lib/calcs/calc-types";
import { fieldErrorAt } from "../combinations/field-error-at";
import { NumberField } from "../combinations/number-field";
import { SelectField } from "../combinations/select-field";
import { propertyFields, type DesignMaterial } from "./material-choices";
import type { FieldValue } from "./member-rows";

export type MaterialFieldsProps = {
  props: Readonly<Record<string, FieldValue>>;
  material: DesignMaterial;
  units: { stress: string; length: string };
  owner: string;
  /** Path of the row in the inputs, e.g. "members[2]". */
  path: string;
  errors: readonly CalcFieldError[];
  readOnly: boolean;
  onField: (key: string, value: FieldValue) => void;
};

/** The properties the chosen standard's check needs, each in the design units. */
export function MaterialFields({ props, material, units, owner, path, errors, readOnly, onField }: MaterialFieldsProps) {
  return (
    <>
      {propertyFields(material).map((f) => {
        const error = fieldErrorAt(errors, `${path}.${f.key}`);
        if (f.kind === "select") {
          const value = props[f.key];
          return (
            <SelectField
              key={f.key}
              label={f.label}
              // A blank optional choice shows what it means (LRFD); a blank required one shows as missing.
              value={value === undefined ? (f.blankMeans ? (f.options?.[0]?.value ?? "") : "") : String(value)}
              options={f.options ?? []}
              // NDS c may be stored as a number; a numeric choice goes back as a number.
              onChange={(v) => onField(f.key, v !== "" && Number.isFinite(Number(v)) ? Number(v) : v)}
              readOnly={readOnly}
              error={error}
              plainCase
            />
          );
        }
        const unit = f.unit === "stress" ? units.stress : f.unit === "area" ? `${units.length}²` : undefined;
        return (
          <NumberField
            key={f.key}
            label={f.label}
            name={f.name}
            owner={owner}
            unit={unit}
            value={typeof props[f.key] === "number" ? Number(props[f.key]) : undefined}
            onChange={(v) => onField(f.key, v)}
            readOnly={readOnly}
            error={error}
            blankMeans={f.blankMeans}
          />
        );
      })}
    </>
  );
}
