"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { toast } from "sonner";
import type { JSONContent } from "@tiptap/core";
import { PackageEditor, type PackageEditorProps } from "@/components/editor/package-editor";
import { ExportPanel, type ExportPanelProps } from "@/components/exports/export-panel";
import { fetchJson } from "@/lib/client/fetch-json";
import { PackageLinks } from "./package-links";
import { StatusTag } from "./status-tag";

export type PackageViewProps = {
  projectId: string;
  pkg: { id: string; title: string; status: string; version: number; updatedAt: string; document: unknown };
  unitSystem: "SI" | "US";
  canEdit: boolean;
  canDelete: boolean;
  review: PackageEditorProps["review"];
  exports?: Omit<ExportPanelProps, "packageId">;
};

export function PackageView({ projectId, pkg, canEdit, canDelete, unitSystem, review, exports }: PackageViewProps) {
  const router = useRouter();
  const [title, setTitle] = useState(pkg.title);
  const [renaming, setRenaming] = useState(false);

  async function rename() {
    try {
      await fetchJson(`/api/v1/packages/${pkg.id}`, { method: "PATCH", body: { title } });
      toast.success("Package renamed.");
      setRenaming(false);
      router.refresh();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not rename.");
    }
  }

  async function remove() {
    if (!window.confirm(`Delete the draft package “${pkg.title}”? This cannot be undone.`)) return;
    try {
      await fetchJson(`/api/v1/packages/${pkg.id}`, { method: "DELETE" });
      toast.success("Package deleted.");
      router.push(`/projects/${projectId}`);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not delete.");
    }
  }

  return (
    <article className="space-y-4" aria-label="Package">
      <header className="flex flex-wrap items-center gap-3">
        {renaming ? (
          <>
            <input className="pp-input max-w-md" value={title} onChange={(e) => setTitle(e.target.value)} aria-label="Package title" />
            <button type="button" className="pp-btn" onClick={rename}>Save title</button>
            <button type="button" className="pp-btn-quiet" onClick={() => setRenaming(false)}>Cancel</button>
          </>
        ) : (
          <h2 className="font-serif text-2xl font-semibold">{pkg.title}</h2>
        )}
        <StatusTag status={pkg.status} />
        <span className="pp-num text-xs text-ink-faint">version {pkg.version}</span>
        <div className="ml-auto flex gap-2">
          {canEdit && !renaming && pkg.status !== "issued" && (
            <button type="button" className="pp-btn-quiet" onClick={() => setRenaming(true)}>Rename</button>
          )}
          {canDelete && pkg.status === "draft" && (
            <button type="button" className="pp-btn-danger" onClick={remove}>Delete draft</button>
          )}
        </div>
      </header>
      <PackageLinks projectId={projectId} packageId={pkg.id} />
      {exports && <ExportPanel packageId={pkg.id} {...exports} />}
      <PackageEditor packageId={pkg.id} initialDocument={pkg.document as JSONContent} initialVersion={pkg.version} canEdit={canEdit && pkg.status !== "issued"} unitSystem={unitSystem} review={review} />
    </article>
  );
}
