import { checkHealth } from "@/lib/health/check-health";
import { publicRoute } from "@/lib/http/public-route";

// GET /api/v1/health — database and file store reachable (for load balancers and the start scripts)
export const GET = publicRoute({}, async () => {
  const health = await checkHealth();
  return Response.json(health, { status: health.ok ? 200 : 503 });
});
