"use client";

import { useState } from "react";
import { trussShapes } from "@/lib/calcs/truss/truss-inputs";
import { applyGenerator, type AppliedGenerator } from "./apply-generator";
import { generatorForm, hasEndPosts, usesDepth, type GeneratorForm, type GeneratorShape } from "./generator-form";
import { GeneratorField } from "./generator-field";
import { shapeName } from "./shape-name";
import type { TrussDraft } from "./truss-draft";

export type GeneratorPanelProps = { draft: TrussDraft; readOnly: boolean; onGenerate: (next: TrussDraft) => void };

type Texts = { span: string; height: string; panels: string };
const show = (v: number | undefined) => (v === undefined ? "" : String(Number(v.toPrecision(12))));
const read = (t: string) => (t.trim() === "" || !Number.isFinite(Number(t)) ? undefined : Number(t));

/**
 * Lays out a common shape from span, depth or rise, and panels. The new
 * geometry replaces the joints, members and supports only after the author
 * confirms, since hand edits to them are lost.
 */
export function GeneratorPanel({ draft, readOnly, onGenerate }: GeneratorPanelProps) {
  const [start] = useState(() => generatorForm(draft));
  const [shape, setShape] = useState<GeneratorShape>(start.shape);
  const [ends, setEnds] = useState<GeneratorForm["ends"]>(start.ends);
  const [texts, setTexts] = useState<Texts>({ span: show(start.span), height: show(start.height), panels: show(start.panels) });
  const [pending, setPending] = useState<AppliedGenerator | null>(null);
  const { length } = draft.units;
  const set = (k: keyof Texts) => (t: string) => { setTexts({ ...texts, [k]: t }); setPending(null); };
  const fieldError = (f: string) => (pending && !pending.ok && pending.field === f ? pending.message : undefined);
  const form: GeneratorForm = { shape, ends, span: read(texts.span), height: read(texts.height), panels: read(texts.panels) };

  return (
    <div className="space-y-3" aria-label="Shape generator" role="group">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-5">
        <label className="block">
          <span className="pp-label">Shape</span>
          <select className="pp-input" value={shape} disabled={readOnly} onChange={(e) => { setShape(e.target.value as GeneratorShape); setPending(null); }}>
            {trussShapes.map((s) => <option key={s} value={s}>{shapeName(s)}</option>)}
          </select>
        </label>
        <GeneratorField label="Span" unit={length} value={texts.span} onChange={set("span")} readOnly={readOnly} error={fieldError("span")} />
        <GeneratorField label={usesDepth(shape) ? "Depth" : "Rise"} unit={length} value={texts.height} onChange={set("height")} readOnly={readOnly} error={fieldError("height")} />
        <GeneratorField label="Panels" value={texts.panels} onChange={set("panels")} readOnly={readOnly} error={fieldError("panels")} />
        {hasEndPosts(shape) && (
          <label className="block">
            <span className="pp-label">End posts</span>
            <select className="pp-input" value={ends} disabled={readOnly} onChange={(e) => setEnds(e.target.value === "inclined" ? "inclined" : "vertical")}>
              <option value="vertical">Vertical</option>
              <option value="inclined">Inclined</option>
            </select>
          </label>
        )}
      </div>
      {fieldError("shape") && <p className="pp-error">{fieldError("shape")}</p>}
      {!readOnly && !(pending && pending.ok) && (
        <button type="button" className="pp-btn-quiet text-xs" onClick={() => setPending(applyGenerator(draft, form))}>
          Generate…
        </button>
      )}
      {pending && pending.ok && (
        <div role="alertdialog" aria-label="Replace the geometry?" className="rounded-sm border border-caution bg-caution-light px-3 py-2 text-sm">
          <p>
            Replace the {draft.joints.length} joints, {draft.members.length} members and {draft.supports.length} supports with a {shapeName(shape).toLowerCase()} of{" "}
            {pending.joints} joints and {pending.members} members? Load cases are kept; line loads move to the new loaded chord; every member takes the first
            member&apos;s section.
          </p>
          <div className="mt-2 flex gap-2">
            <button type="button" className="pp-btn text-xs" onClick={() => { onGenerate(pending.draft); setPending(null); }}>
              Replace the geometry
            </button>
            <button type="button" className="pp-btn-quiet text-xs" onClick={() => setPending(null)}>
              Keep the current geometry
            </button>
          </div>
        </div>
      )}
    </div>
  );
}
