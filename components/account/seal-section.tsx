"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import { applyServerError } from "@/components/forms/apply-server-error";
import { Field } from "@/components/forms/field";
import { fetchJson } from "@/lib/client/fetch-json";
import type { SealProfileView } from "@/lib/seals/get-seal-profile";
import { SealImageUpload } from "./seal-image-upload";
import { SealValidityLine } from "./seal-validity-line";

type Values = { name: string; licenceNumber: string; jurisdiction: string; expiresOn: string };

/** One's own seal profile: the licence details, the seal image, and whether it can seal a revision today. */
export function SealSection({ initial }: { initial: SealProfileView }) {
  const [seal, setSeal] = useState(initial);
  const form = useForm<Values>({
    defaultValues: { name: initial.name ?? "", licenceNumber: initial.licenceNumber ?? "", jurisdiction: initial.jurisdiction ?? "", expiresOn: initial.expiresOn ?? "" },
  });
  const e = form.formState.errors;

  async function onSubmit(v: Values) {
    try {
      const saved = await fetchJson<{ seal: SealProfileView }>("/api/v1/account/seal", { method: "PUT", body: v });
      setSeal(saved.seal);
      form.reset(v);
      toast.success("Seal profile saved.");
    } catch (err) {
      applyServerError(form, err);
    }
  }

  return (
    <section className="pp-panel space-y-4 p-5" aria-labelledby="seal-heading">
      <div className="space-y-1">
        <h2 id="seal-heading" className="text-lg font-semibold">Seal</h2>
        <p className="text-xs text-ink-soft">
          A project engineer (engineer of record) needs a valid seal to issue a revision; the seal used is frozen into the revision.
        </p>
        <SealValidityLine seal={seal} />
      </div>
      <form onSubmit={form.handleSubmit(onSubmit)} className="grid gap-3 sm:grid-cols-2" noValidate aria-label="Seal profile">
        <Field label="Name on the licence" error={e.name?.message}>
          <input className="pp-input" {...form.register("name")} aria-invalid={Boolean(e.name)} />
        </Field>
        <Field label="Licence number" error={e.licenceNumber?.message}>
          <input className="pp-input pp-num" {...form.register("licenceNumber")} aria-invalid={Boolean(e.licenceNumber)} />
        </Field>
        <Field label="Jurisdiction" hint="State, province or country that issued the licence." error={e.jurisdiction?.message}>
          <input className="pp-input" {...form.register("jurisdiction")} aria-invalid={Boolean(e.jurisdiction)} />
        </Field>
        <Field label="Expires on" error={e.expiresOn?.message}>
          <input className="pp-input pp-num" type="date" {...form.register("expiresOn")} aria-invalid={Boolean(e.expiresOn)} />
        </Field>
        <div className="sm:col-span-2">
          <button type="submit" className="pp-btn" disabled={form.formState.isSubmitting}>
            Save seal details
          </button>
        </div>
      </form>
      <SealImageUpload seal={seal} onSaved={setSeal} />
    </section>
  );
}
