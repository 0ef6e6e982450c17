import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { FirmMembersView } from "@/components/firm/firm-members-view";
import { getActingUser } from "@/lib/auth/acting-user";
import { listFirmMembers } from "@/lib/data/firm-members";

export const metadata: Metadata = { title: "Firm" };

export default async function FirmPage() {
  const user = await getActingUser();
  if (!user) redirect("/sign-in");
  const members = await listFirmMembers(user);
  return <FirmMembersView firm={user.firmName} selfId={user.id} isAdmin={user.firmRole === "admin"} initial={members} />;
}
