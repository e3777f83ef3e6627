import { NextResponse } from "next/server";

import { withdrawSchema } from "@/content-schema/sheet-workflow";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";
import { withdrawVersion } from "@/lib/sheets/withdraw-version";

// POST /api/v1/vendors/{vendor}/sheets/{slug}/withdraw: { reason, version? } withdraws the published (or a given) version.
export const POST = withVendor<{ vendor: string; slug: string }>(
  async (request, { access, params }) => {
    const body = parseInput(withdrawSchema, await readJson(request));
    return NextResponse.json(await withdrawVersion({ ...apiActor(access), slug: params.slug, reason: body.reason, number: body.version }));
  },
  { permission: "sheets.publish" },
);
