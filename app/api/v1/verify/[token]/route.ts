import { notFound } from "@/lib/app-error";
import { compareWithIssued, lookUpVerification } from "@/lib/exports/verification";
import { publicRoute } from "@/lib/http/public-route";
import { verifyFileInput, verifyParams } from "@/lib/validation/export-input";

type Ctx = { params: Promise<{ token: string }> };

async function tokenOf(ctx: Ctx): Promise<string> {
  const parsed = verifyParams.safeParse(await ctx.params);
  if (!parsed.success) throw notFound("Verification");
  return parsed.data.token;
}

// GET /api/v1/verify/:token — public: what was issued under this token (project, package, revision, issuer, time, fingerprint, SHA-256)
export const GET = (req: Request, ctx: Ctx) => publicRoute({}, async () => lookUpVerification(await tokenOf(ctx)))(req);

// POST /api/v1/verify/:token — public: is the file whose SHA-256 the browser computed byte-identical to the issued one?
export const POST = (req: Request, ctx: Ctx) => publicRoute({ body: verifyFileInput }, async ({ body }) => compareWithIssued(await tokenOf(ctx), body.sha256))(req);
