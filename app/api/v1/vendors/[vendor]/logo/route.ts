import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";
import { findVendorLogo } from "@/lib/vendors/find-vendor-logo";

// GET /api/v1/vendors/{vendor}/logo: the vendor's logo, sandboxed so an SVG can never run script.
export const GET = withVendor(async (_request, { access }) => {
  const logo = await findVendorLogo({ vendorId: access.vendor.id });
  if (!logo) throw new NotFound();
  return new Response(new Uint8Array(logo.bytes), {
    headers: {
      "Content-Type": logo.type,
      "Content-Security-Policy": "default-src 'none'; style-src 'unsafe-inline'; sandbox",
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "public, max-age=300",
    },
  });
});
