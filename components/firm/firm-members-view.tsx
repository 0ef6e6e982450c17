"use client";

import type { ColumnDef } from "@tanstack/react-table";
import { toast } from "sonner";
import useSWR from "swr";
import { DataTable } from "@/components/tables/data-table";
import { fetchJson } from "@/lib/client/fetch-json";

export type FirmMemberRow = { id: string; email: string; name: string; disabled: boolean; role: "admin" | "member"; invited: boolean; projectCount: number };

export function FirmMembersView({ firm, selfId, isAdmin, initial }: { firm: string; selfId: string; isAdmin: boolean; initial: FirmMemberRow[] }) {
  const { data, mutate } = useSWR<{ members: FirmMemberRow[] }>("/api/v1/firm/members", { fallbackData: { members: initial } });

  async function patch(row: FirmMemberRow, body: { role?: "admin" | "member"; disabled?: boolean }, done: string) {
    try {
      await fetchJson(`/api/v1/firm/members/${row.id}`, { method: "PATCH", body });
      toast.success(done);
      void mutate();
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "That did not work.");
    }
  }

  const columns: ColumnDef<FirmMemberRow, unknown>[] = [
    { accessorKey: "name", header: "Name" },
    { accessorKey: "email", header: "E-mail", cell: (c) => <span className="pp-num text-xs">{String(c.getValue())}</span> },
    { accessorKey: "role", header: "Firm role", cell: (c) => (c.getValue() === "admin" ? "Admin" : "Member") },
    { accessorKey: "projectCount", header: "Projects", cell: (c) => <span className="pp-num">{String(c.getValue())}</span> },
    { id: "state", header: "Account", cell: (c) => (c.row.original.disabled ? "disabled" : c.row.original.invited ? "invited" : "active") },
    {
      id: "actions",
      header: "",
      enableSorting: false,
      cell: (c) => {
        const r = c.row.original;
        if (!isAdmin || r.id === selfId) return null;
        return (
          <span className="flex gap-2">
            <button type="button" className="pp-btn-quiet py-0.5 text-xs" onClick={() => patch(r, { role: r.role === "admin" ? "member" : "admin" }, `${r.name} is now firm ${r.role === "admin" ? "member" : "admin"}.`)}>
              {r.role === "admin" ? "Make member" : "Make admin"}
            </button>
            <button type="button" className="pp-btn-danger py-0.5 text-xs" onClick={() => patch(r, { disabled: !r.disabled }, `${r.name} ${r.disabled ? "enabled" : "disabled"}.`)}>
              {r.disabled ? "Enable" : "Disable"}
            </button>
          </span>
        );
      },
    },
  ];

  return (
    <section className="space-y-4">
      <h1>{firm}</h1>
      <p className="text-sm text-ink-soft">Everyone in the firm. {isAdmin ? "As firm admin you set firm roles and can disable accounts; invite people from a project's Members page." : "Firm admins manage these accounts."}</p>
      <DataTable data={data?.members ?? []} columns={columns} filterLabel="Filter people" empty="Nobody yet." />
    </section>
  );
}
