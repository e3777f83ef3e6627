import { NextResponse } from "next/server";

import { withVendor } from "@/lib/http/with-vendor";
import { readUploadBody } from "@/lib/tickets/attachments/read-upload-body";
import { saveAttachment } from "@/lib/tickets/attachments/save-attachment";
import { supportRole } from "@/lib/tickets/member-kind";

// POST /api/v1/vendors/{vendor}/attachments: a raw file body (name in X-File-Name); type sniffed, 10 MB cap (413).
export const POST = withVendor(
  async (request, { access }) => {
    const who = supportRole(access);
    const bytes = await readUploadBody(request);
    const rawName = request.headers.get("x-file-name") ?? "";
    let fileName = "";
    try {
      fileName = decodeURIComponent(rawName).slice(0, 200);
    } catch {
      fileName = "";
    }
    const attachment = await saveAttachment({ vendorId: access.vendor.id, userId: who.userId, bytes, fileName });
    return NextResponse.json({ attachment }, { status: 201 });
  },
  { rateLimit: { limit: 60, windowSeconds: 60 } },
);
