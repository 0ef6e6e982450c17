import type { ReactNode } from "react";
import { Wordmark } from "@/components/shell/wordmark";
import { SafetyNotice } from "@/components/shell/safety-notice";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center gap-8 px-4 py-12">
      <Wordmark large />
      <main className="pp-panel w-full max-w-sm p-6">{children}</main>
      <SafetyNotice className="max-w-sm text-center" />
    </div>
  );
}
