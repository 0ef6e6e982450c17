import { z } from "zod";
import { readFigure } from "@/lib/figures/read-figure";
import { route } from "@/lib/http/route";

const figureParams = z.object({ packageId: z.uuid(), figureId: z.uuid() });

// GET /api/v1/packages/:packageId/figures/:figureId — a figure's image, to members of the project only
export const GET = route({ permission: "package.read", params: figureParams }, async ({ user, params }) => {
  const { body, contentType } = await readFigure({ actor: user, packageId: params.packageId, figureId: params.figureId });
  return new Response(new Uint8Array(body), { headers: { "content-type": contentType, "cache-control": "private, max-age=3600", "x-content-type-options": "nosniff" } });
});
