"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Field } from "@/components/forms/field";

const schema = z.object({ email: z.email("Give your e-mail address."), password: z.string().min(1, "Give your password.") });
type Values = z.infer<typeof schema>;

export function SignInForm({ next, email }: { next: string; email?: string }) {
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { email: email ?? "", password: "" } });

  async function onSubmit(values: Values) {
    setError(null);
    const res = await signIn("credentials", { ...values, redirect: false });
    if (!res || res.error) {
      setError(res?.error && res.error !== "CredentialsSignin" ? res.error : "E-mail or password is not right.");
      return;
    }
    window.location.assign(next);
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <Field label="E-mail" error={form.formState.errors.email?.message}>
        <input className="pp-input" type="email" autoComplete="username" {...form.register("email")} aria-invalid={Boolean(form.formState.errors.email)} />
      </Field>
      <Field label="Password" error={form.formState.errors.password?.message}>
        <input className="pp-input" type="password" autoComplete="current-password" {...form.register("password")} aria-invalid={Boolean(form.formState.errors.password)} />
      </Field>
      {error && (
        <p role="alert" className="rounded-sm border border-compression bg-compression-light px-3 py-2 text-sm text-compression">
          {error}
        </p>
      )}
      <button type="submit" className="pp-btn w-full justify-center" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
