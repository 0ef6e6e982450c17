"use client";

import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { applyServerError } from "@/components/forms/apply-server-error";
import { Field } from "@/components/forms/field";
import { projectRoleLabel, projectRoles, type ProjectRole } from "@/lib/access/roles";
import { fetchJson } from "@/lib/client/fetch-json";

type Values = { name: string; email: string; role: ProjectRole };

export function InviteForm({ url, onInvited }: { url: string; onInvited: () => void }) {
  const form = useForm<Values>({ defaultValues: { name: "", email: "", role: "engineer" } });
  const e = form.formState.errors;

  async function onSubmit(values: Values) {
    try {
      const res = await fetchJson<{ invited: boolean; mailSent: boolean }>(url, { method: "POST", body: values });
      if (!res.mailSent) toast.warning(`${values.name} was added, but the e-mail could not be sent.`);
      else toast.success(res.invited ? `Invitation sent to ${values.email}.` : `${values.name} added and told by e-mail.`);
      form.reset({ name: "", email: "", role: values.role });
      onInvited();
    } catch (err) {
      applyServerError(form, err);
    }
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="pp-panel grid grid-cols-1 gap-4 p-5 md:grid-cols-4 md:items-end" noValidate aria-label="Invite a member">
      <Field label="Name" error={e.name?.message}>
        <input className="pp-input" {...form.register("name")} aria-invalid={Boolean(e.name)} />
      </Field>
      <Field label="E-mail" error={e.email?.message}>
        <input className="pp-input" type="email" {...form.register("email")} aria-invalid={Boolean(e.email)} />
      </Field>
      <Field label="Role">
        <select className="pp-input" {...form.register("role")}>
          {projectRoles.map((r) => (
            <option key={r} value={r}>
              {projectRoleLabel[r]}
            </option>
          ))}
        </select>
      </Field>
      <button type="submit" className="pp-btn justify-center" disabled={form.formState.isSubmitting}>
        Invite
      </button>
    </form>
  );
}
