import type { ReactNode } from "react";

/** A labelled form field with its error under it. */
export function Field({ label, error, hint, children }: { label: string; error?: string; hint?: string; children: ReactNode }) {
  return (
    <label className="block">
      <span className="pp-label">{label}</span>
      {children}
      {hint && !error && <span className="mt-1 block text-xs text-ink-faint">{hint}</span>}
      {error && <span className="pp-error block" role="alert">{error}</span>}
    </label>
  );
}
