import { sheetActivitySchema } from "@/content-schema/sheet-activity";
import { recordSheetActivity } from "@/lib/field/record-activity";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";

// POST /api/v1/vendors/{vendor}/activity {versionId, kind: "adaptation"}: counts an adaptation for Field results.
export const POST = withVendor(
  async (request, { access }) => {
    const body = sheetActivitySchema.parse(await readJson(request, 1024));
    await recordSheetActivity({ vendorId: access.vendor.id, versionId: body.versionId, kind: "adaptations" });
    return new Response(null, { status: 204 });
  },
  { permission: "library.read", rateLimit: { limit: 120, windowSeconds: 60 } },
);
