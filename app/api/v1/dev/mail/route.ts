import { notFound } from "@/lib/app-error";
import { env } from "@/lib/env";
import { publicRoute } from "@/lib/http/public-route";
import { listCapturedMail } from "@/lib/mail/list-captured-mail";

// GET /api/v1/dev/mail — mail caught by the local fake SMTP server (development and tests only; 404 in production)
export const GET = publicRoute({}, async () => {
  if (env().APP_ENV === "production") throw notFound("Page");
  return { messages: await listCapturedMail() };
});
