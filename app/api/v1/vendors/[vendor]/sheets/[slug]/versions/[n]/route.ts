import { NextResponse } from "next/server";

import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";
import { findLibrarySheet } from "@/lib/sheets/find-library-sheet";
import { sheetVersionJson } from "@/lib/sheets/sheet-json";

// GET /api/v1/vendors/{vendor}/sheets/{slug}/versions/{n}: one readable version (published, superseded or withdrawn).
export const GET = withVendor<{ vendor: string; slug: string; n: string }>(
  async (_request, { access, params }) => {
    const number = /^\d{1,6}$/.test(params.n) ? Number(params.n) : NaN;
    const found = Number.isFinite(number) ? await findLibrarySheet({ vendorId: access.vendor.id, slug: params.slug, number }) : null;
    if (!found) throw new NotFound("No such version.");
    return NextResponse.json(sheetVersionJson({ ...found, slug: found.sheet.slug }));
  },
  { permission: "library.read" },
);
