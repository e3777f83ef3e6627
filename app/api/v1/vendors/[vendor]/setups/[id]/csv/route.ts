import { setupCsv } from "@/lib/bench/setup-csv";
import { withVendor } from "@/lib/http/with-vendor";

import { loadSetupSheet } from "../load-setup-sheet";

// GET /api/v1/vendors/{vendor}/setups/{id}/csv: the setup sheet's numbers as CSV.
export const GET = withVendor<{ vendor: string; id: string }>(
  async (_request, { access, params }) => {
    const { data, fileName } = await loadSetupSheet(access, params.id);
    return new Response(setupCsv(data), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${fileName}.csv"`,
        "cache-control": "private, no-store",
      },
    });
  },
  { permission: "bench.use" },
);
