import type { Metadata } from "next";
import type { ReactNode } from "react";
import "katex/dist/katex.min.css";
import "./globals.css";
import { docFont, numFont, uiFont } from "@/components/shell/fonts";
import { Providers } from "@/components/shell/providers";

export const metadata: Metadata = {
  title: { default: "Panelpoint", template: "%s · Panelpoint" },
  description: "Calculation packages for truss design: live calcs, checking, sealed revisions.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${uiFont.variable} ${docFont.variable} ${numFont.variable}`}>
      <body>
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
