import type { Metadata } from "next";
import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";
import { findOpenInvitation } from "@/lib/data/invitations";

export const metadata: Metadata = { title: "Set your password" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await findOpenInvitation(token);
  if (!invitation) {
    return (
      <>
        <h1 className="mb-2">Invitation not valid</h1>
        <p className="text-sm text-ink-soft">This link has been used or has expired. Ask whoever invited you for a new one.</p>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-1">Welcome, {invitation.name}</h1>
      <p className="mb-4 text-sm text-ink-soft">
        {invitation.firmName} invited <span className="pp-num">{invitation.email}</span> to Panelpoint. Choose a password to finish.
      </p>
      <AcceptInvitationForm token={token} email={invitation.email} />
    </>
  );
}
