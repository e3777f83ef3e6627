import { fieldExportSchema } from "@/content-schema/field-export";
import { attentionFilterSchema, trendRangeSchema, type AttentionFilter, type TrendRange } from "@/content-schema/field-filters";
import type { Vendor } from "@/content-schema/vendor";
import { InvalidInput, NotFound } from "@/lib/errors/domain-errors";
import { confidenceOf } from "@/lib/field/confidence";
import { getCoverageGaps } from "@/lib/field/coverage";
import { listCustomerChanges } from "@/lib/field/customer-changes";
import { coverageGapsCsv, customerChangesCsv, needsAttentionCsv, sheetTrendsCsv, sheetVersionsCsv } from "@/lib/field/field-csv";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { readTrendRange } from "@/lib/field/read-filters";
import { findFieldSheet, findSheetFieldResults } from "@/lib/field/sheet-field-results";
import { getSheetTrends } from "@/lib/field/sheet-trends";
import { withVendor } from "@/lib/http/with-vendor";

const EXPORT_LIMIT = 5000;

async function render(
  vendor: Vendor,
  query: ReturnType<typeof fieldExportSchema.parse>,
  filter: AttentionFilter,
  range: TrendRange,
): Promise<string> {
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
    case "sheet-trends": {
      const sheet = await findFieldSheet({ vendorId: vendor.id, slug: query.sheet });
      if (!sheet) throw new NotFound("No such sheet.");
      // The page's range rules: what is left out falls back to the last 26 weeks.
      const { range: chosen, error } = readTrendRange(range, new Date());
      if (error) throw new InvalidInput(error.replace(/ Showing the last 26 weeks\.$/, ""));
      const trends = await getSheetTrends({ vendorId: vendor.id, sheetId: sheet.id, from: chosen.from, to: chosen.to, z });
      return sheetTrendsCsv(query.sheet, trends.weeks, confidence);
    }
  }
}

// GET /api/v1/vendors/{vendor}/field/{needs-attention[?from&to&class]|customer-changes|coverage-gaps|sheet-versions?sheet=…|sheet-trends?sheet=…[&from&to]}: a Field-results list as CSV.
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
    const range =
      query.list === "sheet-trends"
        ? trendRangeSchema.parse({ from: search.get("from") ?? undefined, to: search.get("to") ?? undefined })
        : {};
    const body = await render(access.vendor, query, filter, range);
    const fileName = `${access.vendor.slug}-${query.list}${"sheet" in query ? `-${query.sheet}` : ""}-${new Date().toISOString().slice(0, 10)}`;
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
