import { databaseState } from "@/lib/db/database-state";
import { queueState } from "@/lib/jobs/boss";

export const dynamic = "force-dynamic";

// GET /api/health: liveness for a load balancer (always 200 while the process runs), with the database's
// and the job queue's state for people and for the "catching up" page.
export async function GET() {
  return Response.json({ ok: true, database: await databaseState(), queue: queueState() }, { headers: { "Cache-Control": "no-store" } });
}
