import { listFirmMembers } from "@/lib/data/firm-members";
import { route } from "@/lib/http/route";

// GET /api/v1/firm/members — everyone in the caller's firm
export const GET = route({ permission: "firm.members.list" }, async ({ user }) => ({ members: await listFirmMembers(user) }));
