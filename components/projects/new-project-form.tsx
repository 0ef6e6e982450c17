"use client";

import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { applyServerError } from "@/components/forms/apply-server-error";
import { fetchJson } from "@/lib/client/fetch-json";
import { ProjectFields, type ProjectFormValues, toProjectInput } from "./project-fields";

export function NewProjectForm({ onCreated, onCancel }: { onCreated: () => void; onCancel: () => void }) {
  const form = useForm<ProjectFormValues>({
    defaultValues: { name: "", jobNumber: "", client: "", site: "", unitSystem: "SI", paperSize: "A4", revisionScheme: "numeric", designCodes: "" },
  });

  async function onSubmit(values: ProjectFormValues) {
    try {
      await fetchJson("/api/v1/projects", { method: "POST", body: toProjectInput(values) });
      toast.success(`Project ${values.jobNumber} created.`);
      onCreated();
    } catch (e) {
      applyServerError(form, e);
    }
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="pp-panel space-y-4 p-5" noValidate aria-label="New project">
      <h2>New project</h2>
      <ProjectFields form={form} />
      <div className="flex gap-2">
        <button type="submit" className="pp-btn" disabled={form.formState.isSubmitting}>
          Create project
        </button>
        <button type="button" className="pp-btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
