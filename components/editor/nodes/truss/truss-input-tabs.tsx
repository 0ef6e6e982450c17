"use client";

import { useState } from "react";
import { errorsForTable } from "@/components/editor/input-table/errors-for-table";
import { InputTable } from "@/components/editor/input-table/input-table";
import type { CalcFieldError } from "@/lib/calcs/calc-types";
import { GeneratorPanel } from "./generator-panel";
import { ImportableTable } from "./importable-table";
import { InputTabs } from "./input-tabs";
import { LoadsPanel } from "./loads-panel";
import { remapErrorKeys } from "./remap-error-keys";
import { supportRows, supportsFromRows } from "./support-rows";
import { trussColumns } from "./truss-columns";
import type { TrussDraft } from "./truss-draft";
import { trussTabErrors, type TrussTab } from "./truss-tab-errors";
import { trussUnitText } from "./truss-unit-text";

export type TrussInputTabsProps = {
  label: string;
  draft: TrussDraft;
  fieldErrors: readonly CalcFieldError[];
  readOnly: boolean;
  onChange: (patch: Partial<TrussDraft>) => void;
};

/** The Truss calc's inputs, one table per tab, each field's problem shown on it and counted on its tab. */
export function TrussInputTabs({ label, draft, fieldErrors, readOnly, onChange }: TrussInputTabsProps) {
  const [tab, setTab] = useState<TrussTab>("joints");
  const columns = trussColumns(trussUnitText(draft.units));
  const { counts, loose } = trussTabErrors(fieldErrors);
  const tabs = [
    {
      id: "joints" as const, label: `Joints (${draft.joints.length})`, problems: counts.joints,
      content: <ImportableTable columns={columns.joints} rows={draft.joints} onChange={(joints) => onChange({ joints })} errors={errorsForTable(fieldErrors, "joints")} readOnly={readOnly} noun="Joints" one="joint" />,
    },
    {
      id: "members" as const, label: `Members (${draft.members.length})`, problems: counts.members,
      content: <ImportableTable columns={columns.members} rows={draft.members} onChange={(members) => onChange({ members })} errors={errorsForTable(fieldErrors, "members")} readOnly={readOnly} noun="Members" one="member" />,
    },
    {
      id: "supports" as const, label: `Supports (${draft.supports.length})`, problems: counts.supports,
      content: (
        <div className="space-y-1">
          <InputTable
            columns={columns.supports}
            rows={supportRows(draft.supports)}
            onChange={(rows) => onChange({ supports: supportsFromRows(rows) })}
            errors={remapErrorKeys(errorsForTable(fieldErrors, "supports"), { direction: "dx" })}
            readOnly={readOnly}
            caption="Supports"
            addLabel="Add support"
            rowName={(r, i) => `support ${r.joint || i + 1}`}
          />
          <p className="text-xs text-ink-faint">A pin takes two reactions; a roller one, along its reaction line (x, y), vertical when left blank. An inclined roller: e.g. 1, 2.</p>
        </div>
      ),
    },
    { id: "loads" as const, label: `Loads (${draft.loadCases.length} ${draft.loadCases.length === 1 ? "case" : "cases"})`, problems: counts.loads, content: <LoadsPanel draft={draft} columns={columns} fieldErrors={fieldErrors} readOnly={readOnly} onChange={onChange} /> },
    { id: "generator" as const, label: "Shape generator", content: <GeneratorPanel draft={draft} readOnly={readOnly} onGenerate={(next) => onChange(next)} /> },
  ];
  return (
    <div className="space-y-2">
      <InputTabs tabs={tabs} active={tab} onSelect={setTab} label={`Inputs of ${label}`} />
      {loose.length > 0 && (
        <ul className="space-y-0.5" aria-label="Other input problems">
          {loose.map((e) => (
            <li key={`${e.path}:${e.message}`} className="pp-error">
              <span className="pp-num">{e.path || "inputs"}</span>: {e.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
