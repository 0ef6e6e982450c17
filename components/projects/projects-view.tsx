"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import { DataTable } from "@/components/tables/data-table";
import { RoleTag } from "@/components/members/role-tag";
import type { ProjectRole } from "@/lib/access/roles";
import { NewProjectForm } from "./new-project-form";

export type ProjectRow = { id: string; name: string; jobNumber: string; client: string; site: string; unitSystem: string; role: ProjectRole | null; packageCount: number; updatedAt: string };

const columns: ColumnDef<ProjectRow, unknown>[] = [
  { accessorKey: "jobNumber", header: "Job", cell: (c) => <span className="pp-num">{String(c.getValue())}</span> },
  { accessorKey: "name", header: "Project", cell: (c) => <Link href={`/projects/${c.row.original.id}`}>{String(c.getValue())}</Link> },
  { accessorKey: "client", header: "Client" },
  { accessorKey: "site", header: "Site" },
  { accessorKey: "unitSystem", header: "Units" },
  { accessorKey: "role", header: "Your role", cell: (c) => <RoleTag role={c.row.original.role} /> },
  { accessorKey: "packageCount", header: "Packages", cell: (c) => <span className="pp-num">{String(c.getValue())}</span> },
  { accessorKey: "updatedAt", header: "Updated", cell: (c) => <span className="pp-num text-xs">{String(c.getValue()).slice(0, 10)}</span> },
];

export function ProjectsView({ initial }: { initial: ProjectRow[] }) {
  const { data, mutate } = useSWR<{ projects: ProjectRow[] }>("/api/v1/projects", { fallbackData: { projects: initial } });
  const [creating, setCreating] = useState(false);
  return (
    <div className="space-y-5">
      <div className="flex items-end justify-between">
        <div>
          <h1>Projects</h1>
          <p className="text-sm text-ink-soft">The projects you are on. Firm admins see every project of the firm.</p>
        </div>
        <button type="button" className="pp-btn" onClick={() => setCreating((v) => !v)} aria-expanded={creating}>
          New project
        </button>
      </div>
      {creating && (
        <NewProjectForm
          onCreated={() => {
            setCreating(false);
            void mutate();
          }}
          onCancel={() => setCreating(false)}
        />
      )}
      <DataTable data={data?.projects ?? []} columns={columns} filterLabel="Filter projects" empty="No projects yet." initialSort={[{ id: "jobNumber", desc: false }]} />
    </div>
  );
}
