import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { findFieldSheet, findSheetFieldResults } from "@/lib/field/sheet-field-results";
import { safeDecode } from "@/lib/http/safe-decode";

/** The sheet a Field-results drill-in is about, under the engineer's own vendor; null answers 404. */
export const findFieldSheetPage = cache(async (vendorSlug: string, sheetSlug: string) => {
  const access = await requirePageAccess(vendorSlug, "field.read", `/${vendorSlug}/drafting/field/${sheetSlug}`);
  const slug = safeDecode(sheetSlug);
  const sheet = slug === null ? null : await findFieldSheet({ vendorId: access.vendor.id, slug });
  return sheet ? { access, sheet } : null;
});

/** One read of a sheet's Field results per request, shared by the sections that stream in separately. */
export const findSheetResults = cache((vendorId: string, sheetId: string, z: number) => findSheetFieldResults({ vendorId, sheetId, z }));
