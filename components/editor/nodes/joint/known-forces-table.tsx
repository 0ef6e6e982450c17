"use client";

import { useState } from "react";
import type { InputColumn } from "@/components/editor/input-table/input-column";
import { InputTable } from "@/components/editor/input-table/input-table";
import { knownFromRows, knownRows, type KnownRow } from "./known-rows";

export type KnownForcesTableProps = {
  known: Readonly<Record<string, number>>;
  unit: string;
  readOnly: boolean;
  onChange: (known: Record<string, number>) => void;
};

const sameKnown = (a: Readonly<Record<string, number>>, b: Readonly<Record<string, number>>) => {
  const ka = Object.keys(a);
  return ka.length === Object.keys(b).length && ka.every((k) => b[k] === a[k]);
};

/**
 * Member forces already known (from another joint or calc), carried into
 * the equilibrium. Rows still being filled in stay on screen but are not
 * stored until they have a member and a force; a change from outside (undo,
 * another session) replaces what is on screen.
 */
export function KnownForcesTable({ known, unit, readOnly, onChange }: KnownForcesTableProps) {
  const [local, setLocal] = useState<{ rows: KnownRow[]; known: Readonly<Record<string, number>> }>(() => ({ rows: knownRows(known), known }));
  const rows = sameKnown(local.known, known) ? local.rows : knownRows(known);
  const { incomplete } = knownFromRows(rows);
  const columns: InputColumn<KnownRow>[] = [
    { key: "member", label: "Member", kind: "text", width: "7rem" },
    { key: "force", label: "N", unit, kind: "number" },
  ];
  const change = (next: KnownRow[]) => {
    const parsed = knownFromRows(next);
    setLocal({ rows: next, known: parsed.known });
    if (!sameKnown(parsed.known, known)) onChange(parsed.known);
  };
  return (
    <section aria-label="Known forces carried in">
      <h4 className="pp-label">Known forces carried in (tension positive)</h4>
      <InputTable columns={columns} rows={rows} onChange={change} readOnly={readOnly} caption="Known forces" addLabel="Add known force" rowName={(r, i) => `known force ${r.member || i + 1}`} />
      {incomplete > 0 && <p className="mt-1 text-xs text-caution">{incomplete === 1 ? "1 row is not used until it has" : `${incomplete} rows are not used until they have`} a member and a force.</p>}
      {rows.length === 0 && readOnly && <p className="text-xs text-ink-faint">None: every member force at the joint is found here.</p>}
    </section>
  );
}
