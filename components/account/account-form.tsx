"use client";

import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { applyServerError } from "@/components/forms/apply-server-error";
import { Field } from "@/components/forms/field";
import { fetchJson } from "@/lib/client/fetch-json";

type Values = { name: string; currentPassword: string; newPassword: string };

export function AccountForm({ name }: { name: string }) {
  const router = useRouter();
  const form = useForm<Values>({ defaultValues: { name, currentPassword: "", newPassword: "" } });
  const e = form.formState.errors;

  async function onSubmit(v: Values) {
    const body = { name: v.name, ...(v.newPassword ? { currentPassword: v.currentPassword, newPassword: v.newPassword } : {}) };
    try {
      await fetchJson("/api/v1/account", { method: "PATCH", body });
      toast.success("Account saved.");
      form.reset({ name: v.name, currentPassword: "", newPassword: "" });
      router.refresh();
    } catch (err) {
      applyServerError(form, err);
    }
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="pp-panel space-y-4 p-5" noValidate aria-label="Account">
      <Field label="Name" error={e.name?.message}>
        <input className="pp-input" {...form.register("name")} aria-invalid={Boolean(e.name)} />
      </Field>
      <Field label="Current password" error={e.currentPassword?.message}>
        <input className="pp-input" type="password" autoComplete="current-password" {...form.register("currentPassword")} aria-invalid={Boolean(e.currentPassword)} />
      </Field>
      <Field label="New password" hint="Leave empty to keep your password. At least 10 characters." error={e.newPassword?.message}>
        <input className="pp-input" type="password" autoComplete="new-password" {...form.register("newPassword")} aria-invalid={Boolean(e.newPassword)} />
      </Field>
      <button type="submit" className="pp-btn" disabled={form.formState.isSubmitting}>
        Save
      </button>
    </form>
  );
}
