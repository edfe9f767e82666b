// GET /api/health: liveness and database reachability.
import { databaseReachable } from "@/lib/server/health";

export const dynamic = "force-dynamic";

export async function GET() {
  if (await databaseReachable()) return Response.json({ status: "ok", db: "up" });
  return Response.json({ status: "degraded", db: "down" }, { status: 503 });
}
