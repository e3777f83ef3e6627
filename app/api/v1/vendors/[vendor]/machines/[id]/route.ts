import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { requireMember } from "@/lib/auth/access";
import { deleteMachine, findMachine, updateMachine } from "@/lib/bench/machines";
import { NotFound } from "@/lib/errors/domain-errors";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { isUuid } from "@/lib/ids/is-uuid";

const machineId = (id: string) => {
  if (!isUuid(id)) throw new NotFound();
  return id;
};

// GET /api/v1/vendors/{vendor}/machines/{id}
export const GET = withVendor<{ vendor: string; id: string }>(
  async (_request, { access, params }) => {
    requireMember(access);
    const machine = await findMachine({ vendorId: access.vendor.id, userId: access.user.id, machineId: machineId(params.id) });
    if (!machine) throw new NotFound();
    return Response.json({ machine });
  },
  { permission: "bench.use" },
);

// PUT /api/v1/vendors/{vendor}/machines/{id}: replace the machine's fields.
export const PUT = withVendor<{ vendor: string; id: string }>(
  async (request, { access, params }) => {
    requireMember(access);
    const fields = parseInput(machineFieldsSchema, await readJson(request));
    return Response.json({
      machine: await updateMachine({ vendorId: access.vendor.id, userId: access.user.id, machineId: machineId(params.id), fields }),
    });
  },
  { permission: "bench.use" },
);

// DELETE /api/v1/vendors/{vendor}/machines/{id}: also deletes its setups and outcomes.
export const DELETE = withVendor<{ vendor: string; id: string }>(
  async (_request, { access, params }) => {
    requireMember(access);
    await deleteMachine({ vendorId: access.vendor.id, userId: access.user.id, machineId: machineId(params.id) });
    return new Response(null, { status: 204 });
  },
  { permission: "bench.use" },
);
