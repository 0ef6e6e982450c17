"use client";

import type { ReactNode } from "react";
import { Toaster } from "sonner";
import { SWRConfig } from "swr";
import { fetchJson } from "@/lib/client/fetch-json";

export function Providers({ children }: { children: ReactNode }) {
  return (
    <SWRConfig value={{ fetcher: fetchJson, revalidateOnFocus: false }}>
      {children}
      <Toaster position="bottom-right" toastOptions={{ className: "font-sans text-sm" }} />
    </SWRConfig>
  );
}
