import { NextResponse } from "next/server";

import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";
import { findLibrarySheet } from "@/lib/sheets/find-library-sheet";
import { sheetVersionJson } from "@/lib/sheets/sheet-json";

// GET /api/v1/vendors/{vendor}/sheets/{slug}: the current published version as structured data.
export const GET = withVendor<{ vendor: string; slug: string }>(
  async (_request, { access, params }) => {
    const found = await findLibrarySheet({ vendorId: access.vendor.id, slug: params.slug });
    if (!found || !found.current) throw new NotFound("No published version of this sheet.");
    return NextResponse.json(sheetVersionJson({ ...found, slug: found.sheet.slug, version: found.current }));
  },
  { permission: "library.read" },
);
