// The receiving mail server records its SPF, DKIM and DMARC checks in Authentication-Results headers
// (RFC 8601). A "fail" from any of them refuses the reply. A missing header or a "pass" proves nothing by
// itself (the sender can write headers too); the signed reply address and the From check remain the gate,
// so a forged header can only get the forger's own mail refused.
const METHOD = /(?:^|[;\s])(dmarc|spf|dkim)\s*=\s*([a-z]+)/gi;

/** Parenthesised comments may say anything ("(no dkim=fail here)"); they are not results. */
function stripComments(value: string): string {
  let out = "";
  let depth = 0;
  for (const ch of value) {
    if (ch === "(") depth++;
    else if (ch === ")") depth = Math.max(0, depth - 1);
    else if (depth === 0) out += ch;
  }
  return out;
}

/** The first failed check named in the headers ("dmarc=fail"), or null when none failed. */
export function failedAuthentication(headers: readonly string[]): string | null {
  for (const header of headers) {
    for (const [, method, result] of stripComments(header.slice(0, 8_000)).matchAll(METHOD)) {
      if (result.toLowerCase() === "fail") return `${method.toLowerCase()}=fail`;
    }
  }
  return null;
}
