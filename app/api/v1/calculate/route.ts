import { runCalculation } from "@/lib/adapt/calculate/run-calculation";
import { readJson } from "@/lib/http/read-json";
import { withPublic } from "@/lib/http/with-vendor";

const MAX_BODY_BYTES = 16 * 1024;

// POST /api/v1/calculate: adapt one operation to a machine; JSON in either unit system, result in both.
export const POST = withPublic(
  async (request) => {
    const body = await readJson(request, MAX_BODY_BYTES);
    const outcome = runCalculation(body);
    if (!outcome.ok)
      return Response.json({ error: "invalid_input", message: outcome.message, fieldErrors: outcome.errors }, { status: 400 });
    return Response.json(outcome.result);
  },
  { limit: 120, windowSeconds: 60 },
);
