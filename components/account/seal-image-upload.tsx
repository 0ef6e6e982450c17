"use client";

import { useState } from "react";
import { toast } from "sonner";
import type { SealProfileView } from "@/lib/seals/get-seal-profile";

/** Seal image: the current one previewed, and a file picker that uploads the raw file (PNG, or SVG cleaned by the server). */
export function SealImageUpload({ seal, onSaved }: { seal: SealProfileView; onSaved: (seal: SealProfileView) => void }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function upload(file: File) {
    setBusy(true);
    setError(null);
    try {
      const res = await fetch("/api/v1/account/seal/image", { method: "PUT", headers: { "content-type": file.type || "application/octet-stream" }, body: file });
      const data = (await res.json().catch(() => ({}))) as { seal?: SealProfileView; error?: { message?: string } };
      if (!res.ok || !data.seal) throw new Error(data.error?.message ?? `Upload failed (${res.status}).`);
      onSaved(data.seal);
      toast.success("Seal image saved.");
    } catch (e) {
      setError(e instanceof Error ? e.message : "Upload failed.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex items-start gap-4">
      <div className="flex h-32 w-32 shrink-0 items-center justify-center rounded-sm border border-rule bg-white">
        {seal.image ? (
          // The sha in the URL makes the browser fetch a new image after each upload.
          // eslint-disable-next-line @next/next/no-img-element
          <img src={`/api/v1/account/seal/image?v=${seal.image.sha256.slice(0, 12)}`} alt="Your seal image" className="max-h-full max-w-full" data-testid="seal-preview" />
        ) : (
          <span className="px-2 text-center text-xs text-ink-faint">No seal image yet</span>
        )}
      </div>
      <label className="block text-sm">
        <span className="pp-label">Seal image</span>
        <input
          type="file"
          accept="image/png,image/svg+xml,.png,.svg"
          disabled={busy}
          aria-invalid={Boolean(error)}
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void upload(file);
            e.target.value = "";
          }}
        />
        <span className="mt-1 block text-xs text-ink-faint">PNG or SVG, at most 512 KB. Scripts and links in an SVG are removed before it is stored.</span>
        {seal.image && <span className="mt-1 block text-xs text-ink-faint">{seal.image.type.toUpperCase()}, {Math.ceil(seal.image.bytes / 1024)} KB</span>}
        {error && <span className="pp-error block" role="alert">{error}</span>}
      </label>
    </div>
  );
}
