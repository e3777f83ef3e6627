import "server-only";

import { cache } from "react";

import { findSheetFieldResults } from "@/lib/field/sheet-field-results";

/** One read of a sheet's Field results per request, shared by the sections that stream in separately. */
export const loadSheetResults = cache((vendorId: string, sheetId: string, z: number) => findSheetFieldResults({ vendorId, sheetId, z }));
