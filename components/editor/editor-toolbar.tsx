"use client";

import type { Editor } from "@tiptap/react";
import { calcKinds } from "@/lib/calcs/calc-types";
import { calcCommand, calcKindName } from "./calc-kind-name";

/** Formatting and insertion, in words; every action also has its keyboard command. */
export function EditorToolbar({ editor }: { editor: Editor }) {
  const btn = (label: string, active: boolean, run: () => void, title?: string) => (
    <button type="button" className={`rounded-sm px-2 py-1 text-sm ${active ? "bg-ink text-paper" : "hover:bg-paper-sunk"}`} aria-pressed={active} onClick={run} title={title ?? label}>
      {label}
    </button>
  );
  return (
    <div className="sticky top-0 z-10 flex flex-wrap items-center gap-1 border-b border-rule bg-paper-raised px-2 py-1" role="toolbar" aria-label="Formatting">
      {btn("H1", editor.isActive("heading", { level: 1 }), () => editor.chain().focus().toggleHeading({ level: 1 }).run(), "Section heading")}
      {btn("H2", editor.isActive("heading", { level: 2 }), () => editor.chain().focus().toggleHeading({ level: 2 }).run(), "Sub-section heading")}
      {btn("Bold", editor.isActive("bold"), () => editor.chain().focus().toggleBold().run())}
      {btn("Italic", editor.isActive("italic"), () => editor.chain().focus().toggleItalic().run())}
      {btn("• List", editor.isActive("bulletList"), () => editor.chain().focus().toggleBulletList().run())}
      {btn("1. List", editor.isActive("orderedList"), () => editor.chain().focus().toggleOrderedList().run())}
      {btn("Table", false, () => editor.chain().focus().insertTable({ rows: 3, cols: 3, withHeaderRow: true }).run())}
      {btn("Reference", false, () => editor.chain().focus().insertContent({ type: "standardReference", attrs: { code: "EN 1990", edition: "2002", clause: "6.4.3.2" } }).run(), "Code or standard reference")}
      {btn("Figure", false, () => editor.chain().focus().insertContent({ type: "figure", attrs: { src: null, caption: "" } }).run(), "Figure with an uploaded image")}
      {btn("Page break", false, () => editor.chain().focus().insertContent({ type: "pageBreak" }).run())}
      <label className="ml-2 flex items-center gap-1 text-sm">
        <span className="text-ink-soft">Insert calc</span>
        <select
          className="pp-input w-auto py-0.5"
          aria-label="Insert calc"
          value=""
          onChange={(e) => {
            const kind = e.target.value as (typeof calcKinds)[number];
            if (kind) editor.chain().focus().insertCalc(kind).run();
          }}
        >
          <option value="">choose…</option>
          {calcKinds.map((k) => (
            <option key={k} value={k}>
              {calcKindName[k]} (type /{calcCommand[k]})
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
