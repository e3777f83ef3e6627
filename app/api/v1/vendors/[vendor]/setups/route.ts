import { setupCreateSchema } from "@/content-schema/setup-fields";
import { requireMember } from "@/lib/auth/access";
import { createSetup } from "@/lib/bench/create-setup";
import { listSetups } from "@/lib/bench/list-setups";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";

// GET /api/v1/vendors/{vendor}/setups: the caller's setups, with last outcome and any newer version.
export const GET = withVendor(
  async (_request, { access }) => {
    requireMember(access);
    return Response.json({ setups: await listSetups({ vendorId: access.vendor.id, userId: access.user.id }) });
  },
  { permission: "bench.use" },
);

// POST /api/v1/vendors/{vendor}/setups: save a version adapted to a machine; the server computes the numbers.
export const POST = withVendor(
  async (request, { access }) => {
    requireMember(access);
    const input = parseInput(setupCreateSchema, await readJson(request));
    const setup = await createSetup({ vendorId: access.vendor.id, userId: access.user.id, input });
    return Response.json({ setup }, { status: 201 });
  },
  { permission: "bench.use", rateLimit: { limit: 60, windowSeconds: 60 } },
);
