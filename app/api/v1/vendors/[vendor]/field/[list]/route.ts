import { fieldExportSchema } from "@/content-schema/field-export";
import { attentionFilterSchema, type AttentionFilter } from "@/content-schema/field-filters";
import type { Vendor } from "@/content-schema/vendor";
import { NotFound } from "@/lib/errors/domain-errors";
import { confidenceOf } from "@/lib/field/confidence";
import { getCoverageGaps } from "@/lib/field/coverage";
import { listCustomerChanges } from "@/lib/field/customer-changes";
import { coverageGapsCsv, customerChangesCsv, needsAttentionCsv, sheetVersionsCsv } from "@/lib/field/field-csv";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { findFieldSheet, findSheetFieldResults } from "@/lib/field/sheet-field-results";
import { withVendor } from "@/lib/http/with-vendor";

const EXPORT_LIMIT = 5000;

async function render(vendor: Vendor, query: ReturnType<typeof fieldExportSchema.parse>, filter: AttentionFilter): Promise<string> {
  const { z, confidence } = confidenceOf(vendor.settings);
  switch (query.list) {
    case "needs-attention":
      return needsAttentionCsv(
        await listNeedsAttention({
          vendorId: vendor.id,
          z,
          limit: EXPORT_LIMIT,
          filters: { from: filter.from, to: filter.to, machineClass: filter.class },
        }),
        confidence,
      );
    case "customer-changes":
      return customerChangesCsv(await listCustomerChanges({ vendorId: vendor.id, limit: EXPORT_LIMIT }));
    case "coverage-gaps":
      return coverageGapsCsv(await getCoverageGaps({ vendorId: vendor.id }));
    case "sheet-versions": {
      const sheet = await findFieldSheet({ vendorId: vendor.id, slug: query.sheet });
      const results = sheet && (await findSheetFieldResults({ vendorId: vendor.id, sheetId: sheet.id, z }));
      if (!results) throw new NotFound("No such sheet.");
      return sheetVersionsCsv(results.sheet.slug, results.versions, confidence);
    }
  }
}

// GET /api/v1/vendors/{vendor}/field/{needs-attention[?from&to&class]|customer-changes|coverage-gaps|sheet-versions?sheet=…}: a Field-results list as CSV.
export const GET = withVendor<{ vendor: string; list: string }>(
  async (request, { access, params }) => {
    const query = fieldExportSchema.parse({ list: params.list, sheet: request.nextUrl.searchParams.get("sheet") ?? undefined });
    const search = request.nextUrl.searchParams;
    const filter =
      query.list === "needs-attention"
        ? attentionFilterSchema.parse({
            from: search.get("from") ?? undefined,
            to: search.get("to") ?? undefined,
            class: search.get("class") ?? undefined,
          })
        : {};
    const body = await render(access.vendor, query, filter);
    const fileName = `${access.vendor.slug}-${query.list}${query.list === "sheet-versions" ? `-${query.sheet}` : ""}-${new Date().toISOString().slice(0, 10)}`;
    return new Response(body, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${fileName}.csv"`,
        "cache-control": "private, no-store",
      },
    });
  },
  { permission: "field.read" },
);
