import { connection } from "next/server";

import { databaseState } from "@/lib/db/database-state";
import { replicaState } from "@/lib/db/replica";
import { publicHealth } from "@/lib/http/public-health";
import { queueState } from "@/lib/jobs/boss";

// GET /api/health: liveness for a load balancer (always 200 while the process runs), with the database's, the
// job queue's and the read replica's state (reads fall back to the primary when the replica is down or behind,
// so a replica problem never makes this process unhealthy).
export async function GET() {
  await connection();
  const [database, replica] = await Promise.all([databaseState(), replicaState()]);
  return Response.json(publicHealth({ database, queue: queueState(), replica }), { headers: { "Cache-Control": "no-store" } });
}
