import { NextResponse } from "next/server";

import { sheetListQuerySchema } from "@/content-schema/api-queries";
import { apiNewSheetSchema } from "@/content-schema/sheet-workflow";
import { parseInput } from "@/lib/errors/zod-field-errors";
import { readJson } from "@/lib/http/read-json";
import { withVendor } from "@/lib/http/with-vendor";
import { apiActor } from "@/lib/sheets/api-actor";
import { createSheet } from "@/lib/sheets/create-sheet";
import { listPublishedSheets } from "@/lib/sheets/list-published-sheets";

// GET /api/v1/vendors/{vendor}/sheets: the published sheets (filters: cutter, material, machineClass).
export const GET = withVendor(
  async (request, { access }) => {
    const filters = sheetListQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    const sheets = await listPublishedSheets({ vendorId: access.vendor.id, filters });
    return NextResponse.json({ sheets });
  },
  { permission: "library.read" },
);

// POST /api/v1/vendors/{vendor}/sheets: a new sheet with a first draft from MDX source { slug, source }.
export const POST = withVendor(
  async (request, { access }) => {
    const body = parseInput(apiNewSheetSchema, await readJson(request, 256 * 1024));
    const created = await createSheet({ ...apiActor(access), slug: body.slug, source: body.source });
    return NextResponse.json(
      { slug: created.slug, number: created.number, state: "draft", revision: created.revision, issues: created.issues },
      { status: 201 },
    );
  },
  { permission: "sheets.author" },
);
