import { route } from "@/lib/http/route";
import { checkHealth } from "@/lib/services/health";

// Public: tells a supervisor whether this server can answer, without a session.
export const GET = route(() => {
  const health = checkHealth();
  return Response.json(health, { status: health.status === "ok" ? 200 : 503, headers: { "cache-control": "no-store" } });
});
