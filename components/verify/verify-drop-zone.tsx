"use client";

import { useState } from "react";

type Outcome = { identical: boolean; message: string; givenSha256: string } | { error: string };

/** SHA-256 of a file in the browser: the file itself never leaves the reader's machine. */
async function sha256Hex(file: File): Promise<string> {
  const digest = await crypto.subtle.digest("SHA-256", await file.arrayBuffer());
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, "0")).join("");
}

/** Drop a PDF to learn whether it is byte-identical to the issued file; the server compares the hash. */
export function VerifyDropZone({ token }: { token: string; expectedSha256: string }) {
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [busy, setBusy] = useState(false);
  const [over, setOver] = useState(false);

  async function check(file: File | undefined) {
    if (!file) return;
    setBusy(true);
    try {
      const sha256 = await sha256Hex(file);
      const res = await fetch(`/api/v1/verify/${token}`, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ sha256 }) });
      const body = await res.json();
      setOutcome(res.ok ? body : { error: body?.error?.message ?? `The check failed (${res.status}).` });
    } catch (e) {
      setOutcome({ error: e instanceof Error ? e.message : "The file could not be read." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section className="space-y-3">
      <label
        data-testid="verify-drop-zone"
        className={`block cursor-pointer rounded border-2 border-dashed p-6 text-center text-sm ${over ? "border-ink" : "border-ink-faint"}`}
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          void check(e.dataTransfer.files[0]);
        }}
      >
        {busy ? "Checking…" : "Drop a PDF here, or choose one, to compare it with the issued file. It is hashed in your browser and not uploaded."}
        <input type="file" accept="application/pdf,.pdf" className="sr-only" data-testid="verify-file-input" onChange={(e) => void check(e.target.files?.[0])} />
      </label>
      {outcome && (
        <p role="status" data-testid="verify-outcome" data-identical={"identical" in outcome ? String(outcome.identical) : "error"} className="text-sm font-semibold">
          {"error" in outcome ? outcome.error : `${outcome.message} (SHA-256 ${outcome.givenSha256})`}
        </p>
      )}
    </section>
  );
}
