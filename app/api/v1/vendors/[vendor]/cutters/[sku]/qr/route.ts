import { cutterQrQuerySchema } from "@/content-schema/api-queries";
import { cutterQr } from "@/lib/bench/cutter-links";
import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { NotFound } from "@/lib/errors/domain-errors";
import { safeDecode } from "@/lib/http/safe-decode";
import { withVendor } from "@/lib/http/with-vendor";

// GET /api/v1/vendors/{vendor}/cutters/{sku}/qr?format=png|svg[&download=1]: QR code of the cutter's short link.
export const GET = withVendor<{ vendor: string; sku: string }>(
  async (request, { access, params }) => {
    const sku = safeDecode(params.sku);
    const cutter = sku === null ? null : await findCutterBySku({ vendorId: access.vendor.id, sku });
    if (!cutter) throw new NotFound();
    const query = cutterQrQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
    const format = query.format;
    const { body, contentType } = await cutterQr(cutter.shortCode, format);
    const headers: Record<string, string> = {
      "content-type": contentType,
      "cache-control": "public, max-age=86400",
      "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'",
    };
    if (query.download)
      headers["content-disposition"] = `attachment; filename="${cutter.sku.replace(/[^A-Za-z0-9._-]/g, "-")}-qr.${format}"`;
    return new Response(body, { headers });
  },
  { permission: "library.read" },
);
