"use client";

import type { UseFormReturn } from "react-hook-form";
import { Field } from "@/components/forms/field";

export type ProjectFormValues = {
  name: string;
  jobNumber: string;
  client: string;
  site: string;
  unitSystem: "SI" | "US";
  paperSize: "A4" | "Letter";
  revisionScheme: "numeric" | "alpha";
  /** One code and edition per line, e.g. "ASCE/SEI 7-22". */
  designCodes: string;
};

/** The form's text area holds one design code per line; the API takes a list. */
export function toProjectInput(v: ProjectFormValues) {
  return { ...v, designCodes: v.designCodes.split("\n").map((s) => s.trim()).filter(Boolean) };
}

export function ProjectFields({ form }: { form: UseFormReturn<ProjectFormValues> }) {
  const { register, formState } = form;
  const e = formState.errors;
  return (
    <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
      <Field label="Project name" error={e.name?.message}>
        <input className="pp-input" {...register("name", { required: "Give the project a name." })} aria-invalid={Boolean(e.name)} />
      </Field>
      <Field label="Job number" error={e.jobNumber?.message}>
        <input className="pp-input pp-num" {...register("jobNumber", { required: "Give the job number." })} aria-invalid={Boolean(e.jobNumber)} />
      </Field>
      <Field label="Client" error={e.client?.message}>
        <input className="pp-input" {...register("client")} />
      </Field>
      <Field label="Site" error={e.site?.message}>
        <input className="pp-input" {...register("site")} />
      </Field>
      <Field label="Units">
        <select className="pp-input" {...register("unitSystem")}>
          <option value="SI">SI (m, kN, mm², MPa)</option>
          <option value="US">US customary (ft, in, kip, ksi)</option>
        </select>
      </Field>
      <Field label="Sheet size">
        <select className="pp-input" {...register("paperSize")}>
          <option value="A4">A4</option>
          <option value="Letter">Letter</option>
        </select>
      </Field>
      <Field label="Revision numbering">
        <select className="pp-input" {...register("revisionScheme")}>
          <option value="numeric">Rev 0, 1, 2 …</option>
          <option value="alpha">Rev A, B, C …</option>
        </select>
      </Field>
      <Field label="Design codes" hint="One code and edition per line." error={e.designCodes?.message}>
        <textarea className="pp-input min-h-20" {...register("designCodes")} />
      </Field>
    </div>
  );
}
