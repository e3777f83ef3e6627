import { NextResponse } from "next/server";

import { submitDraftSchema } from "@/content-schema/sheet-workflow";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";
import { submitDraft } from "@/lib/sheets/submit-draft";

// POST /api/v1/vendors/{vendor}/sheets/{slug}/draft/submit: { changeNote } moves the draft to review.
export const POST = withVendor<{ vendor: string; slug: string }>(
  async (request, { access, params }) => {
    const body = parseInput(submitDraftSchema, await readJson(request));
    return NextResponse.json(await submitDraft({ ...apiActor(access), slug: params.slug, changeNote: body.changeNote }));
  },
  { permission: "sheets.author" },
);
