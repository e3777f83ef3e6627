import { parseVersionNumber } from "@/components/library/find-library-sheet-page";
import { NotFound } from "@/lib/errors/domain-errors";
import { pdfResponse } from "@/lib/http/pdf-response";
import { safeDecode } from "@/lib/http/safe-decode";
import { withVendor } from "@/lib/http/with-vendor";
import { printVersionDataSheet } from "@/lib/library/print-data-sheets";

// GET /{vendor}/library/{sheet}/v/{n}/pdf: the printable data sheet of one published (or superseded) version.
export const GET = withVendor<{ vendor: string; sheet: string; n: string }>(
  async (_request, { access, params }) => {
    const slug = safeDecode(params.sheet);
    const number = parseVersionNumber(params.n);
    if (slug === null || number === null) throw new NotFound();
    const { pdf, fileName } = await printVersionDataSheet({ vendor: access.vendor, slug, number });
    return pdfResponse(pdf, fileName);
  },
  { permission: "library.read", rateLimit: { limit: 30, windowSeconds: 60 } },
);
