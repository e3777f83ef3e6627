import "server-only";

import { appUrl } from "@/lib/http/app-url";
import { createStopToken, readStopToken } from "@/lib/mail/stop-token";
import { escapeHtml } from "@/lib/markdown/render-mail-markdown";

import type { MailKind } from "./mail-kinds";

type Who = { vendorId: string; userId: string };

// The preferences page opens from a mail without signing in: its link is signed for this purpose, vendor and person.
export const createPreferencesToken = (who: Who): string => createStopToken("mail-preferences", who);
export const readPreferencesToken = (token: string): Who | null => readStopToken("mail-preferences", token);

export function preferencesUrl(vendorSlug: string, who: Who, stopped?: MailKind): string {
  const query = new URLSearchParams({ token: createPreferencesToken(who) });
  if (stopped) query.set("stopped", stopped);
  return appUrl(`/${vendorSlug}/mail-preferences?${query}`);
}

/** The footer every preference-bound mail ends with: why it came and where to change that. */
export function mailFooter(vendorSlug: string, vendorName: string, who: Who): { text: string; html: string } {
  const url = preferencesUrl(vendorSlug, who);
  const line = `You get this mail as a member of ${vendorName} on Swarfbook. Choose which mails you get:`;
  return {
    text: `\n--\n${line} ${url}\n`,
    html: `<hr style="border:0;border-top:1px solid #d6d3d1;margin-top:24px"><p style="color:#57534e;font-size:12px">${escapeHtml(line)} <a href="${escapeHtml(url)}">Mail preferences</a></p>`,
  };
}

/** A mail with the footer added to its text part and, when it has one, its HTML part. */
export function withFooter<M extends { text: string; html?: string }>(mail: M, footer: { text: string; html: string }): M {
  return {
    ...mail,
    text: `${mail.text.replace(/\n*$/, "\n")}${footer.text}`,
    ...(mail.html !== undefined ? { html: `${mail.html}\n${footer.html}` } : {}),
  };
}
