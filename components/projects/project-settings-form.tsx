"use client";

import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { applyServerError } from "@/components/forms/apply-server-error";
import { fetchJson } from "@/lib/client/fetch-json";
import { ProjectFields, type ProjectFormValues, toProjectInput } from "./project-fields";

export function ProjectSettingsForm({ projectId, initial, canEdit }: { projectId: string; initial: ProjectFormValues; canEdit: boolean }) {
  const router = useRouter();
  const form = useForm<ProjectFormValues>({ defaultValues: initial });

  async function onSubmit(values: ProjectFormValues) {
    try {
      await fetchJson(`/api/v1/projects/${projectId}`, { method: "PATCH", body: toProjectInput(values) });
      toast.success("Project settings saved.");
      router.refresh();
    } catch (e) {
      applyServerError(form, e);
    }
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate aria-label="Project settings">
      <h2>Settings</h2>
      <fieldset disabled={!canEdit} className="space-y-4">
        <ProjectFields form={form} />
        {canEdit ? (
          <button type="submit" className="pp-btn" disabled={form.formState.isSubmitting}>
            Save settings
          </button>
        ) : (
          <p className="text-sm text-ink-soft">Only the project engineer or a firm admin changes these.</p>
        )}
      </fieldset>
    </form>
  );
}
