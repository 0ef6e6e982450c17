"use client";

import { NodeViewWrapper, type NodeViewProps } from "@tiptap/react";
import { useState } from "react";

/** A figure: upload an image to the package's file store, caption it. */
export function FigureView({ node, updateAttributes, editor, extension }: NodeViewProps) {
  const { src, caption, alt } = node.attrs as { src: string | null; caption: string; alt: string };
  const packageId = (extension.options as { packageId?: string }).packageId;
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const editable = editor.isEditable;

  async function upload(file: File) {
    setBusy(true);
    setError(null);
    const form = new FormData();
    form.set("file", file);
    const res = await fetch(`/api/v1/packages/${packageId}/figures`, { method: "POST", body: form });
    const data = (await res.json().catch(() => ({}))) as { src?: string; error?: { message?: string } };
    setBusy(false);
    if (!res.ok || !data.src) {
      setError(data.error?.message ?? `Upload failed (${res.status}).`);
      return;
    }
    updateAttributes({ src: data.src, alt: alt || file.name.replace(/\.[a-z]+$/i, "") });
  }

  return (
    <NodeViewWrapper as="figure" className="not-prose my-4 rounded-sm border border-rule bg-paper-raised p-3" data-type="figure" contentEditable={false}>
      {src ? (
        <img src={src} alt={alt} className="mx-auto max-h-96" />
      ) : (
        <div className="flex h-32 items-center justify-center border border-dashed border-rule-strong text-sm text-ink-faint">No image yet</div>
      )}
      {editable && (
        <label className="mt-2 block text-sm">
          <span className="pp-label">{src ? "Replace image" : "Upload image"} (PNG, JPEG or WebP, at most 8 MB)</span>
          <input type="file" accept="image/png,image/jpeg,image/webp" disabled={busy} onChange={(e) => e.target.files?.[0] && upload(e.target.files[0])} />
        </label>
      )}
      {error && <p className="pp-error" role="alert">{error}</p>}
      <figcaption className="mt-2">
        {editable ? (
          <input className="pp-input text-sm" placeholder="Caption" aria-label="Figure caption" value={caption ?? ""} onChange={(e) => updateAttributes({ caption: e.target.value })} />
        ) : (
          <span className="text-sm text-ink-soft">{caption}</span>
        )}
      </figcaption>
    </NodeViewWrapper>
  );
}
