// GET /api/health: liveness for a load balancer.
export function GET() {
  return Response.json({ ok: true });
}
