// The receiving mail server records its SPF, DKIM and DMARC checks in Authentication-Results headers
// (RFC 8601). A "fail" from any of them refuses the reply. With INBOUND_MAIL_REQUIRE_AUTH on (the default),
// a reply is accepted only when the receiving server's own header shows a DKIM pass aligned with the From
// domain or a DMARC pass: the From header alone can be written by anyone.
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

type Result = { method: string; result: string; props: Map<string, string> };

/** The authserv-id and the results of one header: "mx.example.net; dkim=pass header.d=b.test; dmarc=pass". */
function parse(header: string): { server: string; results: Result[] } {
  const [server = "", ...parts] = stripComments(header.slice(0, 8_000)).split(";");
  const results = parts.flatMap((part) => {
    const [head, ...rest] = part.trim().split(/\s+/);
    const [method, result] = (head ?? "").split("=");
    if (!method || !result) return [];
    const props = new Map(
      rest
        .map((p) => p.split("="))
        .filter((kv) => kv.length === 2)
        .map(([k, v]) => [k.toLowerCase(), v.toLowerCase().replace(/^"|"$/g, "")]),
    );
    return [{ method: method.toLowerCase(), result: result.toLowerCase(), props }];
  });
  return { server: server.trim().split(/\s+/)[0]?.toLowerCase() ?? "", results };
}

/** Relaxed alignment: the signing domain is the From domain or one of its parent domains (never a bare TLD). */
const aligned = (signer: string, fromDomain: string) =>
  signer.includes(".") && (fromDomain === signer || fromDomain.endsWith(`.${signer}`));

/**
 * Whether the receiving server vouches for the From domain: a DKIM pass by that domain (or a parent) or a DMARC
 * pass for it. Only the receiving server's header counts: the one carrying INBOUND_MAIL_AUTHSERV_ID when that
 * is set, else the topmost one (receiving servers add theirs on top; the sender's own copies sit below it).
 */
export function senderAuthenticated(headers: readonly string[], from: string, serverId = process.env.INBOUND_MAIL_AUTHSERV_ID): boolean {
  const fromDomain = from.trim().toLowerCase().split("@").pop() ?? "";
  if (!fromDomain) return false;
  const own = headers.map(parse).filter((h) => (serverId ? h.server === serverId.trim().toLowerCase() : true));
  const trusted = serverId ? own : own.slice(0, 1);
  return trusted.some(({ results }) =>
    results.some((r) => {
      if (r.result !== "pass") return false;
      if (r.method === "dkim") {
        const signer = r.props.get("header.d") ?? r.props.get("header.i")?.split("@").pop() ?? "";
        return aligned(signer, fromDomain);
      }
      if (r.method === "dmarc") {
        const domain = r.props.get("header.from");
        return domain === undefined || domain === fromDomain;
      }
      return false;
    }),
  );
}

/** INBOUND_MAIL_REQUIRE_AUTH (on by default): accept a reply only when the receiving server vouches for its From. */
export const inboundAuthRequired = () => (process.env.INBOUND_MAIL_REQUIRE_AUTH ?? "on").trim().toLowerCase() !== "off";
