"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import useSWR from "swr";
import { applyServerError } from "@/components/forms/apply-server-error";
import { DataTable } from "@/components/tables/data-table";
import { fetchJson } from "@/lib/client/fetch-json";
import { StatusTag } from "./status-tag";

export type PackageRow = { id: string; projectId: string; title: string; status: string; version: number; updatedAt: string };

export function PackagesView({ projectId, initial, canCreate }: { projectId: string; initial: PackageRow[]; canCreate: boolean }) {
  const url = `/api/v1/projects/${projectId}/packages`;
  const { data, mutate } = useSWR<{ packages: PackageRow[] }>(url, { fallbackData: { packages: initial } });
  const form = useForm<{ title: string }>({ defaultValues: { title: "" } });

  const columns: ColumnDef<PackageRow, unknown>[] = [
    { accessorKey: "title", header: "Package", cell: (c) => <Link href={`/projects/${projectId}/packages/${c.row.original.id}`}>{String(c.getValue())}</Link> },
    { accessorKey: "status", header: "Status", cell: (c) => <StatusTag status={String(c.getValue())} /> },
    { accessorKey: "version", header: "Saves", cell: (c) => <span className="pp-num">{String(c.getValue())}</span> },
    { accessorKey: "updatedAt", header: "Updated", cell: (c) => <span className="pp-num text-xs">{String(c.getValue()).slice(0, 16).replace("T", " ")}</span> },
  ];

  async function onCreate(values: { title: string }) {
    try {
      await fetchJson(url, { method: "POST", body: values });
      toast.success(`Package “${values.title}” started.`);
      form.reset();
      void mutate();
    } catch (e) {
      applyServerError(form, e);
    }
  }

  return (
    <section className="space-y-4" aria-label="Packages">
      <h2>Calculation packages</h2>
      <DataTable data={data?.packages ?? []} columns={columns} filterLabel="Filter packages" empty="No packages yet." />
      {canCreate && (
        <form onSubmit={form.handleSubmit(onCreate)} className="flex items-start gap-2" noValidate aria-label="New package">
          <div className="w-80">
            <input className="pp-input" placeholder="Title of a new package" aria-label="Package title" {...form.register("title")} aria-invalid={Boolean(form.formState.errors.title)} />
            {form.formState.errors.title && <span className="pp-error block">{form.formState.errors.title.message}</span>}
          </div>
          <button type="submit" className="pp-btn" disabled={form.formState.isSubmitting}>
            New package
          </button>
        </form>
      )}
    </section>
  );
}
