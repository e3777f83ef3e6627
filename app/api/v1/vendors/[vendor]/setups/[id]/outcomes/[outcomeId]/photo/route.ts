import { requireMember } from "@/lib/auth/access";
import { findOutcomePhoto } from "@/lib/bench/outcomes";
import { NotFound } from "@/lib/errors/domain-errors";
import { withVendor } from "@/lib/http/with-vendor";
import { isUuid } from "@/lib/ids/is-uuid";

// GET /api/v1/vendors/{vendor}/setups/{id}/outcomes/{outcomeId}/photo: the owner's outcome photo, re-sniffed.
export const GET = withVendor<{ vendor: string; id: string; outcomeId: string }>(
  async (_request, { access, params }) => {
    requireMember(access);
    if (!isUuid(params.outcomeId)) throw new NotFound();
    const photo = await findOutcomePhoto({ vendorId: access.vendor.id, userId: access.user.id, outcomeId: params.outcomeId });
    if (!photo) throw new NotFound();
    return new Response(new Uint8Array(photo.bytes), {
      headers: {
        "content-type": photo.contentType,
        "cache-control": "private, max-age=300",
        "content-security-policy": "default-src 'none'",
        "content-disposition": "inline",
      },
    });
  },
  { permission: "bench.use" },
);
