import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { AccountForm } from "@/components/account/account-form";
import { SealSection } from "@/components/account/seal-section";
import { getActingUser } from "@/lib/auth/acting-user";
import { getSealProfile } from "@/lib/seals/get-seal-profile";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await getActingUser();
  if (!user) redirect("/sign-in");
  const seal = await getSealProfile({ actor: user });
  return (
    <section className="max-w-lg space-y-4">
      <h1>Your account</h1>
      <dl className="grid grid-cols-[8rem_1fr] gap-y-1 text-sm">
        <dt className="text-ink-soft">E-mail</dt>
        <dd className="pp-num">{user.email}</dd>
        <dt className="text-ink-soft">Firm</dt>
        <dd>{user.firmName} ({user.firmRole === "admin" ? "firm admin" : "firm member"})</dd>
      </dl>
      <AccountForm name={user.name} />
      <SealSection initial={seal} />
    </section>
  );
}
