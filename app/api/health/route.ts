import { connection } from "next/server";

import { replicaState } from "@/lib/db/replica";

// GET /api/health: liveness for a load balancer, and the read replica's lag (reads fall back to the primary
// when it is down or behind, so a replica problem never makes this process unhealthy).
export async function GET() {
  await connection();
  return Response.json({ ok: true, replica: await replicaState() });
}
