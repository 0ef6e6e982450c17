import { withAuth } from "next-auth/middleware";
import { env } from "@/lib/env";

// Pages of the signed-in app redirect to the sign-in page; the API answers 401 itself.
export default withAuth({ secret: env().NEXTAUTH_SECRET, pages: { signIn: "/sign-in" } });

export const config = {
  matcher: ["/projects/:path*", "/firm/:path*", "/account/:path*", "/dev/:path*"],
};
