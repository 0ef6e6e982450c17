import { SAFETY_TEXT } from "@/lib/safety-notice";

export function SafetyNotice({ className = "" }: { className?: string }) {
  return <p className={`text-xs leading-5 text-ink-faint ${className}`}>{SAFETY_TEXT}</p>;
}
