import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { requireMember } from "@/lib/auth/access";
import { createMachine, listMachines } from "@/lib/bench/machines";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";

// GET /api/v1/vendors/{vendor}/machines: the caller's machines in this vendor.
export const GET = withVendor(
  async (_request, { access }) => {
    requireMember(access);
    return Response.json({ machines: await listMachines({ vendorId: access.vendor.id, userId: access.user.id }) });
  },
  { permission: "bench.use" },
);

// POST /api/v1/vendors/{vendor}/machines: register a machine (metric numbers, feeds and lengths may carry units).
export const POST = withVendor(
  async (request, { access }) => {
    requireMember(access);
    const fields = parseInput(machineFieldsSchema, await readJson(request));
    const machine = await createMachine({ vendorId: access.vendor.id, userId: access.user.id, fields });
    return Response.json({ machine }, { status: 201 });
  },
  { permission: "bench.use", rateLimit: { limit: 60, windowSeconds: 60 } },
);
