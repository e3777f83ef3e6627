import { NextResponse } from "next/server";

import { withVendor } from "@/lib/http/with-vendor";
import { getSearchEngine } from "@/search/engines/choose-engine";
import { runSearch } from "@/search/run/run-search";
import { searchParamsSchema } from "@/search/run/search-params";

// GET /api/v1/vendors/{vendor}/search?q=&material=&operation=&diameterMm=&flutes=&page=
export const GET = withVendor<{ vendor: string }>(
  async (request, { access }) => {
    const p = searchParamsSchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    const result = await runSearch(getSearchEngine(), {
      vendorId: access.vendor.id,
      q: p.q,
      filters: { material: p.material, materialGroup: p.materialGroup, operation: p.operation, diameterMm: p.diameterMm, flutes: p.flutes },
      page: p.page,
      perPage: p.perPage,
    });
    return NextResponse.json(result, { headers: { "Cache-Control": "private, no-store" } });
  },
  { permission: "library.read", rateLimit: { limit: 300, windowSeconds: 60 } },
);
