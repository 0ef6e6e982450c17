import { updateAccount } from "@/lib/account/update-account";
import { route } from "@/lib/http/route";
import { accountUpdateInput } from "@/lib/validation/account-input";

// GET /api/v1/account — the signed-in person and their firm
export const GET = route({ permission: "account.read" }, async ({ user }) => ({
  account: { id: user.id, email: user.email, name: user.name, firm: user.firmName, firmRole: user.firmRole },
}));

// PATCH /api/v1/account — change one's own name or password
export const PATCH = route({ permission: "account.update", body: accountUpdateInput }, async ({ user, body }) => {
  await updateAccount({ actor: user, ...body });
  return { ok: true };
});
