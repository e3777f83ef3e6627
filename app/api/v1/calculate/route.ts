import { runCalculation } from "@/lib/adapt/calculate/run-calculation";
import { readJson } from "@/lib/http/read-json";
import { withPublic } from "@/lib/http/with-vendor";

const MAX_BODY_BYTES = 16 * 1024;
// A result is a few kilobytes, inside the first round trip either way, so gzip would save the caller no time and cost
// both ends CPU on every call; no-transform keeps the server (and any proxy) from compressing it.
const RESULT_HEADERS = { "Cache-Control": "no-transform" };

// POST /api/v1/calculate: adapt one operation to a machine; JSON in either unit system, result in both.
export const POST = withPublic(
  async (request) => {
    const body = await readJson(request, MAX_BODY_BYTES);
    const outcome = runCalculation(body);
    if (!outcome.ok)
      return Response.json({ error: "invalid_input", message: outcome.message, fieldErrors: outcome.errors }, { status: 400 });
    return Response.json(outcome.result, { headers: RESULT_HEADERS });
  },
  { limit: 120, windowSeconds: 60 },
);
