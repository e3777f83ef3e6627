import { randomBytes, randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";

import { bodyWithNonce, storedBody } from "@/lib/library/page-store-body";

// A stored page is kept as bytes between its placeholder nonces; every answer joins them around a fresh nonce.
const PLACEHOLDER = randomBytes(24).toString("base64url");
const freshNonce = () => btoa(randomUUID());

const pages: [string, string][] = [
  ["no placeholder", "<p>plain page</p>"],
  ["empty page", ""],
  ["only a placeholder", PLACEHOLDER],
  ["placeholders side by side, at both ends", `${PLACEHOLDER}${PLACEHOLDER}<p>x</p>${PLACEHOLDER}`],
  ["text beyond ASCII", `<p nonce="${PLACEHOLDER}">Ø 6 mm · 18 000 min⁻¹ · ± 5 µm — ça coupe</p>`.repeat(50)],
];

describe("stored page bodies with a nonce per answer", () => {
  it.each(pages)("reads back as the page with this answer's nonce: %s", (_name, html) => {
    const body = storedBody(html, PLACEHOLDER);
    expect(body.bytes).toBe(Buffer.byteLength(html.split(PLACEHOLDER).join("")));
    for (const nonce of [freshNonce(), freshNonce()]) {
      expect(Buffer.from(bodyWithNonce(body, nonce)).toString()).toBe(html.split(PLACEHOLDER).join(nonce));
    }
  });

  it("gives two answers two different nonces and never the placeholder", () => {
    const body = storedBody(pages[4][1], PLACEHOLDER);
    const [a, b] = [freshNonce(), freshNonce()];
    const one = Buffer.from(bodyWithNonce(body, a)).toString();
    expect(one).not.toBe(Buffer.from(bodyWithNonce(body, b)).toString());
    expect(one).not.toContain(PLACEHOLDER);
    expect(one.split(`nonce="${a}"`).length - 1).toBe(50);
  });
});
