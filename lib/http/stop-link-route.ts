import "server-only";

import { NextResponse, type NextRequest } from "next/server";

import type { MailKind } from "@/lib/mail-preferences/mail-kinds";
import { setMailPreference } from "@/lib/mail-preferences/mail-preferences";
import { preferencesUrl } from "@/lib/mail-preferences/preferences-link";
import { readStopToken, type StopPurpose } from "@/lib/mail/stop-token";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { plainPage } from "./plain-page";
import { readBodyBytes } from "./read-json";
import { withPublic } from "./with-vendor";

type Texts = { ask: string; askText: string; button: string; done: string; doneText: string; broken: string };

/**
 * GET and POST of a signed one-click stop link (/api/v1/vendors/{vendor}/…/stop?token=…), no sign-in needed.
 * GET only asks, because mail scanners open links; POST turns that kind of mail off. The page's own button lands
 * on the person's mail preferences; a mail client's List-Unsubscribe-Post one-click request (RFC 8058) gets a
 * plain answer. A token works only under the vendor it was made for.
 */
export function stopLinkRoute(purpose: StopPurpose, kind: MailKind, texts: Texts) {
  async function resolve(request: NextRequest) {
    const url = new URL(request.url);
    const who = readStopToken(purpose, url.searchParams.get("token") ?? "");
    const vendor = who ? await findVendorBySlug(url.pathname.split("/")[4] ?? "") : null;
    return who && vendor && vendor.id === who.vendorId ? { who, vendor } : null;
  }
  const broken = () => plainPage("This link does not work", texts.broken, { status: 400 });
  const rate = { limit: 30, windowSeconds: 60 };
  return {
    GET: withPublic(
      async (request) => ((await resolve(request)) ? plainPage(texts.ask, texts.askText, { button: texts.button }) : broken()),
      rate,
    ),
    POST: withPublic(async (request) => {
      const found = await resolve(request);
      if (!found) return broken();
      const body = new TextDecoder().decode(await readBodyBytes(request, 4096));
      await setMailPreference({ ...found.who, kind, enabled: false });
      const preferences = preferencesUrl(found.vendor.slug, found.who, kind);
      if (new URLSearchParams(body).get("via") === "page") return NextResponse.redirect(preferences, 303);
      return plainPage(texts.done, texts.doneText, { link: { href: preferences, label: "All your mail preferences" } });
    }, rate),
  };
}
