// GET /api/health: liveness and database reachability.
import { sequelize } from "@/models";

export const dynamic = "force-dynamic";

export async function GET() {
  try {
    await sequelize.query("SELECT 1");
    return Response.json({ status: "ok", db: "up" });
  } catch {
    return Response.json({ status: "degraded", db: "down" }, { status: 503 });
  }
}
