import { publicRoute } from "@/lib/http/public-route";
import { acceptInvitation } from "@/lib/invitations/accept-invitation";
import { acceptInvitationInput } from "@/lib/validation/account-input";

// POST /api/v1/invitations/accept — set a password from an invitation link (no sign-in: the token is the proof)
export const POST = publicRoute({ body: acceptInvitationInput }, async ({ body }) => acceptInvitation(body));
