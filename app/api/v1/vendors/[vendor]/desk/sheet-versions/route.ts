import { NextResponse } from "next/server";

import { pickerVersionQuerySchema } from "@/content-schema/api-queries";
import { findPickerVersions } from "@/lib/desk/picker-versions";
import { withVendor } from "@/lib/http/with-vendor";

// GET /api/v1/vendors/{vendor}/desk/sheet-versions?q=: the sheet versions a staff reply can embed, found by words.
export const GET = withVendor(
  async (request, { access }) => {
    const { q } = pickerVersionQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    return NextResponse.json(await findPickerVersions({ vendorId: access.vendor.id, q }));
  },
  { permission: "desk.use" },
);
