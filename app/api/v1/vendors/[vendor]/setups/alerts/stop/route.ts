import { NextResponse } from "next/server";

import { readAlertStopToken } from "@/lib/bench/alert-token";
import { setChangeAlerts } from "@/lib/bench/mail-preferences";
import { withPublic } from "@/lib/http/with-vendor";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

const page = (title: string, text: string, status = 200) =>
  new NextResponse(
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${title}</title></head><body style="font-family:system-ui,sans-serif;max-width:36rem;margin:3rem auto;padding:0 1rem;color:#1c1917"><h1 style="font-size:1.4rem">${title}</h1><p>${text}</p></body></html>`,
    { status, headers: { "content-type": "text/html; charset=utf-8", "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'", "cache-control": "no-store" } },
  );

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
