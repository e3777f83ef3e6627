import "server-only";

import QRCode from "qrcode";

import { db } from "@/lib/db/knex";
import { appUrl } from "@/lib/http/app-url";

/** Where a short cutter code leads; short codes are unique across vendors, so the code alone decides. */
export async function findCutterLink(code: string): Promise<{ vendorSlug: string; sku: string } | null> {
  if (!/^[a-z0-9]{3,16}$/i.test(code)) return null;
  const row = await db("cutters as c")
    .join("vendors as v", "v.id", "c.vendor_id")
    .whereRaw("lower(c.short_code) = lower(?)", [code])
    .first("v.slug", "c.sku");
  return row ? { vendorSlug: row.slug, sku: row.sku } : null;
}

export const cutterShortUrl = (shortCode: string) => appUrl(`/c/${shortCode}`);

/** A QR code of the cutter's short link, for a tool-box label. */
export async function cutterQr(
  shortCode: string,
  format: "png" | "svg",
): Promise<{ body: Uint8Array<ArrayBuffer> | string; contentType: string }> {
  const url = cutterShortUrl(shortCode);
  if (format === "svg")
    return { body: await QRCode.toString(url, { type: "svg", margin: 2, errorCorrectionLevel: "M" }), contentType: "image/svg+xml" };
  return {
    body: new Uint8Array(await QRCode.toBuffer(url, { type: "png", width: 512, margin: 2, errorCorrectionLevel: "M" })),
    contentType: "image/png",
  };
}
