import { renderSetupSheetPdf } from "@/lib/bench/setup-sheet-pdf";
import { withVendor } from "@/lib/http/with-vendor";

import { loadSetupSheet } from "../load-setup-sheet";

// GET /api/v1/vendors/{vendor}/setups/{id}/pdf: the one-page setup sheet for the machine.
export const GET = withVendor<{ vendor: string; id: string }>(
  async (_request, { access, params }) => {
    const { data, versionUrl, fileName, vendorName } = await loadSetupSheet(access, params.id);
    const pdf = await renderSetupSheetPdf({ data, versionUrl, vendorName });
    return new Response(new Uint8Array(pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": `attachment; filename="${fileName}.pdf"`,
        "cache-control": "private, no-store",
      },
    });
  },
  { permission: "bench.use", rateLimit: { limit: 30, windowSeconds: 60 } },
);
