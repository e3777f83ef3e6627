import type { NextRequest } from "next/server";

import { findCutterLink } from "@/lib/bench/cutter-links";
import { NotFound } from "@/lib/errors/domain-errors";
import { safeDecode } from "@/lib/http/safe-decode";
import { withPublic } from "@/lib/http/with-vendor";

// GET /c/{code}: a cutter's short link (printed as a QR code on the tool box) → its page in the Library.
export const GET = withPublic(
  async (request: NextRequest) => {
    const code = safeDecode(new URL(request.url).pathname.split("/")[2] ?? "");
    const link = code === null ? null : await findCutterLink(code);
    if (!link) throw new NotFound("No cutter has that code.");
    // A relative Location keeps the visitor on whatever host they came in by.
    return new Response(null, {
      status: 302,
      headers: { location: `/${link.vendorSlug}/library/cutters/${encodeURIComponent(link.sku)}` },
    });
  },
  { limit: 120, windowSeconds: 60 },
);
