import { route } from "@/lib/http/route";
import { getSealProfile } from "@/lib/seals/get-seal-profile";
import { saveSealProfile } from "@/lib/seals/save-seal-profile";
import { sealProfileInput } from "@/lib/validation/seal-input";

// GET /api/v1/account/seal — one's own seal profile and whether it can seal today
export const GET = route({ permission: "seal.read" }, async ({ user }) => ({ seal: await getSealProfile({ actor: user }) }));

// PUT /api/v1/account/seal — set the name, licence number, jurisdiction and expiry date of one's own seal
export const PUT = route({ permission: "seal.manage", body: sealProfileInput }, async ({ user, body }) => {
  await saveSealProfile({ actor: user, input: body });
  return { seal: await getSealProfile({ actor: user }) };
});
