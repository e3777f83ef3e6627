import { NextResponse } from "next/server";

import { listDeskViews } from "@/lib/desk/saved-views";
import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";

// GET /api/v1/vendors/{vendor}/tickets/views: the agent's queue views with live counts.
export const GET = withVendor(
  async (_request, { access }) => {
    if (!access.user) throw new NotFound();
    return NextResponse.json({ views: await listDeskViews({ vendorId: access.vendor.id, userId: access.user.id }) });
  },
  { permission: "desk.use" },
);
