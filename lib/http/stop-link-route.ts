import "server-only";

import type { NextRequest } from "next/server";

import { readStopToken, type StopPurpose } from "@/lib/mail/stop-token";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

import { plainPage } from "./plain-page";
import { withPublic } from "./with-vendor";

type Texts = { ask: string; askText: string; button: string; done: string; doneText: string; broken: string };

/**
 * GET and POST of a signed one-click stop link (/api/v1/vendors/{vendor}/…/stop?token=…), no sign-in needed.
 * GET only asks, because mail scanners open links; POST stops (the button, or a mail client's
 * List-Unsubscribe-Post one-click request, RFC 8058). A token works only under the vendor it was made for.
 */
export function stopLinkRoute(purpose: StopPurpose, stop: (who: { vendorId: string; userId: string }) => Promise<void>, texts: Texts) {
  async function resolve(request: NextRequest) {
    const url = new URL(request.url);
    const who = readStopToken(purpose, url.searchParams.get("token") ?? "");
    const vendor = who ? await getVendorBySlug(url.pathname.split("/")[4] ?? "") : null;
    return who && vendor && vendor.id === who.vendorId ? who : null;
  }
  const broken = () => plainPage("This link does not work", texts.broken, { status: 400 });
  const rate = { limit: 30, windowSeconds: 60 };
  return {
    GET: withPublic(async (request) => ((await resolve(request)) ? plainPage(texts.ask, texts.askText, { button: texts.button }) : broken()), rate),
    POST: withPublic(async (request) => {
      const who = await resolve(request);
      if (!who) return broken();
      await stop(who);
      return plainPage(texts.done, texts.doneText);
    }, rate),
  };
}
