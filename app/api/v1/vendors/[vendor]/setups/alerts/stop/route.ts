import { readAlertStopToken } from "@/lib/bench/alert-token";
import { setChangeAlerts } from "@/lib/bench/mail-preferences";
import { plainPage as page } from "@/lib/http/plain-page";
import { withPublic } from "@/lib/http/with-vendor";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

async function stop(request: Request) {
  const token = new URL(request.url).searchParams.get("token") ?? "";
  const who = readAlertStopToken(token);
  // A token only works under the vendor it was made for.
  const vendorSlug = new URL(request.url).pathname.split("/")[4] ?? "";
  const vendor = who ? await getVendorBySlug(vendorSlug) : null;
  if (!who || !vendor || vendor.id !== who.vendorId) return page("This link does not work", "The stop link is incomplete or was changed. Turn change alerts off on your Bench instead.", 400);
  await setChangeAlerts({ ...who, enabled: false });
  return page("Change alerts stopped", "You will get no more e-mails about new versions of sheets you saved setups from. You can turn them back on from your Bench.");
}

// GET|POST /api/v1/vendors/{vendor}/setups/alerts/stop?token=…: one-click stop, signed, no sign-in needed.
export const GET = withPublic(stop, { limit: 30, windowSeconds: 60 });
export const POST = withPublic(stop, { limit: 30, windowSeconds: 60 });
