"use client";

import { useState } from "react";
import useSWR from "swr";
import { toast } from "sonner";
import type { ExportDto } from "@/lib/exports/list-exports";
import { fetchJson } from "@/lib/client/fetch-json";

export type ExportPanelProps = {
  packageId: string;
  /** The package's issued revisions, oldest first. */
  revisions: { id: string; label: string }[];
  canExport: boolean;
};

function statusText(e: ExportDto): string {
  if (e.status === "queued") return e.error ? `Queued — ${e.error}` : "Queued";
  if (e.status === "rendering") return e.sheet && e.sheetCount ? `Rendering sheet ${e.sheet} of ${e.sheetCount}` : "Rendering";
  if (e.status === "failed") return `Failed: ${e.error ?? "no reason given"}`;
  return "Done";
}

/**
 * Export buttons for the draft and each issued revision, and the history with
 * live progress: re-read every two seconds while something is queued or rendering.
 */
export function ExportPanel({ packageId, revisions, canExport }: ExportPanelProps) {
  const url = `/api/v1/packages/${packageId}/exports`;
  const { data, mutate } = useSWR<{ exports: ExportDto[] }>(url, {
    refreshInterval: (latest) => (latest?.exports.some((e) => e.status === "queued" || e.status === "rendering") ? 2000 : 15000),
  });
  const [asking, setAsking] = useState<string | null>(null);

  async function ask(format: "pdf" | "docx", revisionId: string | null) {
    const key = `${format}:${revisionId ?? "draft"}`;
    setAsking(key);
    try {
      await fetchJson(url, { method: "POST", body: { format, revisionId } });
      await mutate();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "Could not start the export.");
    } finally {
      setAsking(null);
    }
  }

  const targets = [{ id: null as string | null, label: "Draft" }, ...[...revisions].reverse().map((r) => ({ id: r.id as string | null, label: `Rev ${r.label}` }))];
  return (
    <section className="space-y-3 rounded border border-rule p-4" aria-label="Exports" data-testid="export-panel">
      <h3 className="font-semibold">Exports</h3>
      {canExport && (
        <ul className="space-y-1 text-sm">
          {targets.map((t) => (
            <li key={t.id ?? "draft"} className="flex flex-wrap items-center gap-2" data-testid="export-target" data-revision={t.id ?? "draft"}>
              <span className="w-16">{t.label}</span>
              {(["pdf", "docx"] as const).map((format) => (
                <button key={format} type="button" className="pp-btn-quiet" disabled={asking !== null} onClick={() => void ask(format, t.id)} data-testid={`export-${format}`}>
                  {format === "pdf" ? "Export PDF" : "Export DOCX"}
                </button>
              ))}
              {t.id === null && <span className="text-xs text-ink-faint">prints PRELIMINARY — NOT FOR CONSTRUCTION</span>}
            </li>
          ))}
        </ul>
      )}
      {data && data.exports.length === 0 && <p className="text-sm text-ink-faint">No exports yet.</p>}
      {data && data.exports.length > 0 && (
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-ink-faint">
            <tr><th>What</th><th>Status</th><th>Asked by</th><th>When</th></tr>
          </thead>
          <tbody>
            {data.exports.map((e) => (
              <tr key={e.id} data-testid="export-row" data-status={e.status} data-format={e.format}>
                <td>{e.format.toUpperCase()} · {e.revisionLabel ? `Rev ${e.revisionLabel}` : "Draft"}{e.signed ? " · signed" : ""}</td>
                <td>
                  {e.status === "done" && e.downloadUrl ? (
                    <>
                      Done — <a className="underline" href={e.downloadUrl} data-testid="export-download">Download</a>
                      {e.verifyPath && <> · <a className="underline" href={e.verifyPath} target="_blank" rel="noreferrer">Verification page</a></>}
                    </>
                  ) : (
                    <span className={e.status === "failed" ? "text-red-700" : ""}>{statusText(e)}</span>
                  )}
                </td>
                <td>{e.requestedBy ?? "—"}</td>
                <td className="pp-num">{new Date(e.createdAt).toLocaleString()}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
