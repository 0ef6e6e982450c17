"use client";

import type { ColumnDef } from "@tanstack/react-table";
import { toast } from "sonner";
import useSWR from "swr";
import { DataTable } from "@/components/tables/data-table";
import { projectRoleLabel, projectRoles, type ProjectRole } from "@/lib/access/roles";
import { fetchJson } from "@/lib/client/fetch-json";
import { InviteForm } from "./invite-form";
import { RoleTag } from "./role-tag";

export type MemberRow = { userId: string; email: string; name: string; role: ProjectRole; invited: boolean; disabled: boolean };

export type MembersViewProps = { projectId: string; selfId: string; initial: MemberRow[]; canManage: boolean; canInvite: boolean };

export function MembersView({ projectId, selfId, initial, canManage, canInvite }: MembersViewProps) {
  const url = `/api/v1/projects/${projectId}/members`;
  const { data, mutate } = useSWR<{ members: MemberRow[] }>(url, { fallbackData: { members: initial } });

  async function act(promise: Promise<unknown>, done: string) {
    try {
      await promise;
      toast.success(done);
      void mutate();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "That did not work.");
    }
  }

  const columns: ColumnDef<MemberRow, unknown>[] = [
    { accessorKey: "name", header: "Name", cell: (c) => <span>{String(c.getValue())}{c.row.original.userId === selfId ? " (you)" : ""}</span> },
    { accessorKey: "email", header: "E-mail", cell: (c) => <span className="pp-num text-xs">{String(c.getValue())}</span> },
    {
      accessorKey: "role",
      header: "Role",
      cell: (c) =>
        canManage ? (
          <select
            className="pp-input py-1"
            aria-label={`Role of ${c.row.original.name}`}
            value={c.row.original.role}
            onChange={(e) => act(fetchJson(`${url}/${c.row.original.userId}`, { method: "PATCH", body: { role: e.target.value } }), `${c.row.original.name} is now ${projectRoleLabel[e.target.value as ProjectRole].toLowerCase()}.`)}
          >
            {projectRoles.map((r) => (
              <option key={r} value={r}>
                {projectRoleLabel[r]}
              </option>
            ))}
          </select>
        ) : (
          <RoleTag role={c.row.original.role} />
        ),
    },
    { id: "state", header: "Account", cell: (c) => <span className="text-xs text-ink-soft">{c.row.original.disabled ? "disabled" : c.row.original.invited ? "invited, no password yet" : "active"}</span> },
    {
      id: "actions",
      header: "",
      enableSorting: false,
      cell: (c) =>
        canManage ? (
          <button type="button" className="pp-btn-danger py-0.5 text-xs" onClick={() => act(fetchJson(`${url}/${c.row.original.userId}`, { method: "DELETE" }), `${c.row.original.name} removed from the project.`)}>
            Remove
          </button>
        ) : null,
    },
  ];

  return (
    <section className="space-y-5" aria-label="Members">
      <h2>Members and roles</h2>
      <DataTable data={data?.members ?? []} columns={columns} filterLabel="Filter members" empty="Nobody on this project yet." />
      {canInvite && <InviteForm url={url} onInvited={() => void mutate()} />}
    </section>
  );
}
