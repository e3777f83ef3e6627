import { requireMember } from "@/lib/auth/access";
import { findSetup } from "@/lib/bench/list-setups";
import { listOutcomes } from "@/lib/bench/outcomes";
import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";

// GET /api/v1/vendors/{vendor}/setups/{id}: one setup with its outcome history.
export const GET = withVendor<{ vendor: string; id: string }>(
  async (_request, { access, params }) => {
    requireMember(access);
    const owner = { vendorId: access.vendor.id, userId: access.user.id, setupId: params.id };
    const setup = await findSetup(owner);
    if (!setup) throw new NotFound();
    return Response.json({ setup, outcomes: await listOutcomes(owner) });
  },
  { permission: "bench.use" },
);
