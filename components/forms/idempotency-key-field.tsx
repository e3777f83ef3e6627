"use client";

import { useState } from "react";

// getRandomValues works on plain http too, where randomUUID does not.
function newKey(): string {
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, "0")).join("");
}

/**
 * A hidden `idempotencyKey`: a resubmit of the same form (a retry after an error, a double click) sends the
 * same key and the server posts once; `renewOn` changing (a successful send) starts a new one.
 * The server's and the browser's first keys differ; either is a fresh random key, so the mismatch is harmless.
 */
export function IdempotencyKeyField({ renewOn }: { renewOn: unknown }) {
  const [seen, setSeen] = useState(renewOn);
  const [key, setKey] = useState(newKey);
  if (renewOn !== seen) {
    setSeen(renewOn);
    setKey(newKey());
  }
  return <input type="hidden" name="idempotencyKey" value={key} suppressHydrationWarning />;
}
