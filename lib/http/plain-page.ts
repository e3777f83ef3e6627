import { NextResponse } from "next/server";

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

type Options = { status?: number; button?: string; link?: { href: string; label: string } };

/**
 * A small self-contained HTML answer (stop links and the like): no scripts, no app shell.
 * With `button`, the page holds a form that POSTs back to the same address (marked as sent from the page).
 */
export function plainPage(title: string, text: string, options: Options = {}): NextResponse {
  const form = options.button
    ? `<form method="post"><button type="submit" style="font:inherit;padding:.6rem 1rem;min-height:44px;border:1px solid #1c1917;border-radius:6px;background:#1c1917;color:#fff">${esc(options.button)}</button><input type="hidden" name="via" value="page"></form>`
    : "";
  const link = options.link ? `<p><a href="${esc(options.link.href)}">${esc(options.link.label)}</a></p>` : "";
  return new NextResponse(
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${esc(title)}</title></head><body style="font-family:system-ui,sans-serif;max-width:36rem;margin:3rem auto;padding:0 1rem;color:#1c1917"><main><h1 style="font-size:1.4rem">${esc(title)}</h1><p>${esc(text)}</p>${form}${link}</main></body></html>`,
    {
      status: options.status ?? 200,
      headers: {
        "content-type": "text/html; charset=utf-8",
        "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'; form-action 'self'",
        "cache-control": "no-store",
      },
    },
  );
}
