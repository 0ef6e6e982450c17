import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { AppHeader } from "@/components/shell/app-header";
import { SafetyNotice } from "@/components/shell/safety-notice";
import { getActingUser } from "@/lib/auth/acting-user";
import { env } from "@/lib/env";

export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await getActingUser();
  if (!user) redirect("/sign-in");
  return (
    <div className="flex min-h-screen flex-col">
      <AppHeader name={user.name} email={user.email} firm={user.firmName} firmRole={user.firmRole} showDevMail={env().APP_ENV !== "production"} />
      <main className="mx-auto w-full max-w-6xl flex-1 px-6 py-6">{children}</main>
      <footer className="border-t border-rule px-6 py-3">
        <SafetyNotice className="mx-auto max-w-6xl" />
      </footer>
    </div>
  );
}
