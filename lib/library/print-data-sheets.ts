import "server-only";

import type { Vendor } from "@/content-schema/vendor";
import { cutterShortUrl } from "@/lib/bench/cutter-links";
import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { NotFound } from "@/lib/errors/domain-errors";
import { appUrl } from "@/lib/http/app-url";
import { renderCutterDataSheetPdf } from "@/lib/pdf/cutter-data-sheet-pdf";
import type { Branding } from "@/lib/pdf/data-sheet-parts";
import { renderDataSheetPdf } from "@/lib/pdf/data-sheet-pdf";
import { findLibrarySheet } from "@/lib/sheets/find-library-sheet";
import { listPublishedSheets } from "@/lib/sheets/list-published-sheets";
import { formatDate } from "@/lib/ui/dates";
import { findVendorLogo } from "@/lib/vendors/find-vendor-logo";

import { cutterSpecs, dataSheetData, dataSheetOperations, ownCautions } from "./data-sheet-data";
import { STANDARD_CAUTIONS } from "./standard-cautions";

/** A cutter data sheet lists at most this many sheets (one or two pages for a cutter's usual handful). */
const MAX_SHEETS_PER_CUTTER = 12;

async function brandingOf(vendor: Vendor): Promise<Branding> {
  const logo = vendor.hasLogo ? await findVendorLogo({ vendorId: vendor.id }) : null;
  // The PDF library draws PNG and JPEG; a WebP logo is left out rather than failing the print.
  const format = logo?.type === "image/png" ? "png" : logo?.type === "image/jpeg" ? "jpg" : null;
  return { vendorName: vendor.name, accentColor: vendor.accentColor, logo: logo && format ? { data: logo.bytes, format } : null };
}

export const versionUrl = (vendorSlug: string, sheetSlug: string, number: number) =>
  appUrl(`/${vendorSlug}/library/${sheetSlug}/v/${number}`);

/**
 * The data sheet of one published or superseded version. Drafts and versions in review are not found in the
 * Library at all; a withdrawn version is read online with its reason, never printed for the shop floor.
 */
export async function printVersionDataSheet({
  vendor,
  slug,
  number,
  now = new Date(),
}: {
  vendor: Vendor;
  slug: string;
  number: number;
  now?: Date;
}) {
  const data = await findLibrarySheet({ vendorId: vendor.id, slug, number });
  if (!data || (data.version.state !== "published" && data.version.state !== "superseded"))
    throw new NotFound("No printable version of that sheet was found.");
  const pdf = await renderDataSheetPdf({
    data: dataSheetData(data, versionUrl(vendor.slug, data.sheet.slug, data.version.number)),
    branding: await brandingOf(vendor),
    printedOn: formatDate(now),
  });
  return { pdf, fileName: `${data.sheet.slug}-v${data.version.number}` };
}

/** Every current published sheet of one cutter on one data sheet. */
export async function printCutterDataSheet({ vendor, sku, now = new Date() }: { vendor: Vendor; sku: string; now?: Date }) {
  const cutter = await findCutterBySku({ vendorId: vendor.id, sku });
  if (!cutter) throw new NotFound("That cutter was not found.");
  const summaries = await listPublishedSheets({ vendorId: vendor.id, filters: { cutter: cutter.sku }, limit: MAX_SHEETS_PER_CUTTER });
  const sheets = [];
  for (const summary of summaries) {
    const data = await findLibrarySheet({ vendorId: vendor.id, slug: summary.slug });
    if (!data || data.version.state !== "published") continue;
    sheets.push({
      title: data.version.title,
      material: data.material.name,
      machineClass: data.machineClass.name,
      number: data.version.number,
      published: formatDate(data.version.publishedAt),
      url: versionUrl(vendor.slug, data.sheet.slug, data.version.number),
      operations: dataSheetOperations(data),
      cautions: ownCautions(data),
    });
  }
  const pdf = await renderCutterDataSheetPdf({
    data: {
      cutter: cutterSpecs(cutter),
      shortUrl: cutterShortUrl(cutter.shortCode),
      sheets,
      standardCautions: STANDARD_CAUTIONS.map((c) => c.text),
    },
    branding: await brandingOf(vendor),
    printedOn: formatDate(now),
  });
  return { pdf, fileName: `${cutter.sku}-data-sheet` };
}
