"use client";

import type { CalcFieldError } from "@/lib/calcs/calc-types";
import { fieldErrorAt } from "../combinations/field-error-at";
import { NumberField } from "../combinations/number-field";
import { SelectField } from "../combinations/select-field";
import type { FieldValue } from "./member-rows";
import { sectionFields, shapesFor } from "./section-shapes";

export type SectionFieldsProps = {
  section: Readonly<Record<string, FieldValue>>;
  material: string;
  /** Design length unit, mm or in. */
  length: string;
  /** e.g. "member U1U2", for the fields' spoken names. */
  owner: string;
  /** Path of the section in the inputs, e.g. "members[2].section". */
  path: string;
  errors: readonly CalcFieldError[];
  readOnly: boolean;
  onShape: (shape: string) => void;
  onField: (key: string, value: FieldValue) => void;
};

/** A member's section: its shape, then the dimensions (or A and r) that shape is entered by. */
export function SectionFields({ section, material, length, owner, path, errors, readOnly, onShape, onField }: SectionFieldsProps) {
  const shape = String(section.shape ?? "");
  const exact = errors.find((e) => e.path === path || e.path === `${path}.shape`)?.message;
  return (
    <>
      <SelectField className="col-span-2" label="Section" value={shape} options={shapesFor(material)} onChange={onShape} readOnly={readOnly} error={exact} />
      {sectionFields(shape).map((f) => (
        <NumberField
          key={f.key}
          label={f.label}
          name={f.name}
          owner={owner}
          unit={f.area ? `${length}²` : length}
          value={typeof section[f.key] === "number" ? Number(section[f.key]) : undefined}
          onChange={(v) => onField(f.key, v)}
          readOnly={readOnly}
          error={fieldErrorAt(errors, `${path}.${f.key}`)}
          blankMeans={f.blankMeans}
        />
      ))}
      {shape === "timber" && (
        <SelectField
          label="Product"
          value={section.product === "glulam" ? "glulam" : "sawn"}
          options={[{ value: "sawn", label: "sawn lumber" }, { value: "glulam", label: "glulam" }]}
          onChange={(v) => onField("product", v)}
          readOnly={readOnly}
          error={fieldErrorAt(errors, `${path}.product`)}
        />
      )}
    </>
  );
}
