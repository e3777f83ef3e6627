// A stored page's body, kept as bytes between the placeholder nonces, so that an answer only joins bytes around
// its fresh nonce instead of splitting and encoding the whole page's text again.
export type StoredBody = {
  /** The page's bytes between the placeholders, in order. */
  parts: Buffer[];
  bytes: number;
};

export function storedBody(html: string, placeholder: string): StoredBody {
  const parts = html.split(placeholder).map((part) => Buffer.from(part));
  return { parts, bytes: parts.reduce((n, part) => n + part.length, 0) };
}

/** The page with `nonce` wherever the placeholder stood. */
export function bodyWithNonce(body: StoredBody, nonce: string): Uint8Array<ArrayBuffer> {
  const value = Buffer.from(nonce);
  const out = new Uint8Array(body.bytes + value.length * (body.parts.length - 1));
  let at = 0;
  body.parts.forEach((part, i) => {
    if (i > 0) {
      out.set(value, at);
      at += value.length;
    }
    out.set(part, at);
    at += part.length;
  });
  return out;
}
