import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { findImage } from "@/lib/catalogue/image-store";
import { NotFound } from "@/lib/errors/domain-errors";
import { safeDecode } from "@/lib/http/safe-decode";
import { withVendor } from "@/lib/http/with-vendor";

// GET /{vendor}/library/cutters/{sku}/image: the cutter's picture, for whoever may read the Library.
export const GET = withVendor<{ vendor: string; sku: string }>(
  async (_request, { access, params }) => {
    const sku = safeDecode(params.sku);
    const cutter = sku === null ? null : await findCutterBySku({ vendorId: access.vendor.id, sku });
    const image = cutter?.imageKey ? await findImage({ vendorId: access.vendor.id, key: cutter.imageKey }) : null;
    if (!image) throw new NotFound("No image.");
    return new Response(new Uint8Array(image.bytes), {
      headers: {
        "content-type": image.contentType,
        "cache-control": "private, max-age=300",
        "x-content-type-options": "nosniff",
        "content-security-policy": "default-src 'none'",
      },
    });
  },
  { permission: "library.read", rateLimit: { limit: 600, windowSeconds: 60 } },
);
