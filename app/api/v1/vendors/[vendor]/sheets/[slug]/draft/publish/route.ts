import { NextResponse } from "next/server";

import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";
import { publishDraft } from "@/lib/sheets/publish-draft";

// POST /api/v1/vendors/{vendor}/sheets/{slug}/draft/publish: publishes the approved version; the previous one is superseded.
export const POST = withVendor<{ vendor: string; slug: string }>(
  async (_request, { access, params }) => {
    const { number, state, superseded } = await publishDraft({ ...apiActor(access), slug: params.slug });
    return NextResponse.json({ number, state, superseded });
  },
  { permission: "sheets.publish" },
);
