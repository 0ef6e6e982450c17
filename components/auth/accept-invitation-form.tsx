"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { z } from "zod";
import { Field } from "@/components/forms/field";
import { fetchJson } from "@/lib/client/fetch-json";
import { passwordSchema } from "@/lib/auth/password-policy";

const schema = z
  .object({ password: passwordSchema, repeat: z.string() })
  .refine((v) => v.password === v.repeat, { message: "The two passwords differ.", path: ["repeat"] });
type Values = z.infer<typeof schema>;

export function AcceptInvitationForm({ token, email }: { token: string; email: string }) {
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { password: "", repeat: "" } });
  const errors = form.formState.errors;

  async function onSubmit(values: Values) {
    try {
      await fetchJson("/api/v1/invitations/accept", { method: "POST", body: { token, password: values.password } });
      toast.success("Password set. Sign in to continue.");
      window.location.assign(`/sign-in?email=${encodeURIComponent(email)}`);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not set the password.");
    }
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <Field label="New password" error={errors.password?.message} hint="At least 10 characters.">
        <input className="pp-input" type="password" autoComplete="new-password" {...form.register("password")} aria-invalid={Boolean(errors.password)} />
      </Field>
      <Field label="Repeat it" error={errors.repeat?.message}>
        <input className="pp-input" type="password" autoComplete="new-password" {...form.register("repeat")} aria-invalid={Boolean(errors.repeat)} />
      </Field>
      <button type="submit" className="pp-btn w-full justify-center" disabled={form.formState.isSubmitting}>
        Set password
      </button>
    </form>
  );
}
