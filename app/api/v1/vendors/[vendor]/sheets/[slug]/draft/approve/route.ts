import { NextResponse } from "next/server";

import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";
import { approveDraft } from "@/lib/sheets/approve-draft";

// POST /api/v1/vendors/{vendor}/sheets/{slug}/draft/approve: approval by an engineer other than the author.
export const POST = withVendor<{ vendor: string; slug: string }>(
  async (_request, { access, params }) => NextResponse.json(await approveDraft({ ...apiActor(access), slug: params.slug })),
  { permission: "sheets.review" },
);
