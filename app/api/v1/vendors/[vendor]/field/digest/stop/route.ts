import { setWeeklyDigest } from "@/lib/bench/mail-preferences";
import { plainPage as page } from "@/lib/http/plain-page";
import { withPublic } from "@/lib/http/with-vendor";
import { readStopToken } from "@/lib/mail/stop-token";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

async function stop(request: Request) {
  const url = new URL(request.url);
  const who = readStopToken("weekly-digest", url.searchParams.get("token") ?? "");
  // A token only works under the vendor it was made for.
  const vendor = who ? await getVendorBySlug(url.pathname.split("/")[4] ?? "") : null;
  if (!who || !vendor || vendor.id !== who.vendorId) return page("This link does not work", "The stop link is incomplete or was changed. Turn the digest off on the Field results page instead.", 400);
  await setWeeklyDigest({ ...who, enabled: false });
  return page("Weekly digest stopped", "You will get no more weekly Field-results digests. You can turn it back on from Drafting → Field results.");
}

// GET|POST /api/v1/vendors/{vendor}/field/digest/stop?token=…: one-click stop, signed, no sign-in needed.
export const GET = withPublic(stop, { limit: 30, windowSeconds: 60 });
export const POST = withPublic(stop, { limit: 30, windowSeconds: 60 });
