import { z } from "zod";

import { importCutters } from "@/lib/catalogue/import-cutters";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { errorResponse } from "@/lib/http/error-response";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";

const bodySchema = z.object({ csv: z.string().min(1).max(2_000_000), mode: z.enum(["all-or-nothing", "valid-rows"]) });

// POST /{vendor}/drafting/cutters/import/run: imports a cutter CSV in one transaction and streams
// NDJSON progress lines ({"done","total"}) followed by one {"result"} or {"error"} line.
export const POST = withVendor(
  async (request, { access }) => {
    const body = parseInput(bodySchema, await readJson(request, 2_100_000));
    const actor = apiActor(access);
    const encoder = new TextEncoder();
    const stream = new ReadableStream({
      async start(controller) {
        const send = (line: unknown) => controller.enqueue(encoder.encode(`${JSON.stringify(line)}\n`));
        try {
          const result = await importCutters({
            ...actor,
            csv: body.csv,
            mode: body.mode,
            onProgress: (done, total) => send({ done, total }),
          });
          send({ result: { imported: result.imported, skipped: result.skipped } });
        } catch (error) {
          send({ error: await errorResponse(error).json() });
        } finally {
          controller.close();
        }
      },
    });
    return new Response(stream, { headers: { "content-type": "application/x-ndjson", "cache-control": "no-store" } });
  },
  { permission: "catalogue.edit", rateLimit: { limit: 10, windowSeconds: 60 } },
);
