import { NotFound } from "@/lib/errors/domain-errors";
import { pdfResponse } from "@/lib/http/pdf-response";
import { safeDecode } from "@/lib/http/safe-decode";
import { withVendor } from "@/lib/http/with-vendor";
import { printCutterDataSheet } from "@/lib/library/print-data-sheets";

// GET /{vendor}/library/cutters/{sku}/pdf: every current published sheet of one cutter, for the box or the wall.
export const GET = withVendor<{ vendor: string; sku: string }>(
  async (_request, { access, params }) => {
    const sku = safeDecode(params.sku);
    if (sku === null) throw new NotFound();
    const { pdf, fileName } = await printCutterDataSheet({ vendor: access.vendor, sku });
    return pdfResponse(pdf, fileName);
  },
  { permission: "library.read", rateLimit: { limit: 30, windowSeconds: 60 } },
);
