import { NextResponse } from "next/server";

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A small self-contained HTML answer (stop links and the like): no scripts, no app shell. */
export function plainPage(title: string, text: string, status = 200): NextResponse {
  return new NextResponse(
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${esc(title)}</title></head><body style="font-family:system-ui,sans-serif;max-width:36rem;margin:3rem auto;padding:0 1rem;color:#1c1917"><h1 style="font-size:1.4rem">${esc(title)}</h1><p>${esc(text)}</p></body></html>`,
    { status, headers: { "content-type": "text/html; charset=utf-8", "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'", "cache-control": "no-store" } },
  );
}
