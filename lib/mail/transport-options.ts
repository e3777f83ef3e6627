import { isIP } from "node:net";
import type SMTPTransport from "nodemailer/lib/smtp-transport";

// Pure: how outgoing mail reaches the relay. STARTTLS is used whenever the relay offers it (nodemailer's default once
// `ignoreTLS` is off) and required when credentials or sign-in links would otherwise cross a network in clear text:
// plain SMTP is accepted only to a relay on this machine with no credentials. SMTP_SECURE=true means implicit TLS
// (port 465).

export function isLoopbackHost(host: string): boolean {
  const bare = host.replace(/^\[(.*)\]$/, "$1").toLowerCase();
  if (bare === "localhost") return true;
  if (isIP(bare) === 4) return bare.startsWith("127.");
  if (isIP(bare) === 6) return bare === "::1" || bare === "0:0:0:0:0:0:0:1" || /^::ffff:127\./.test(bare);
  return false;
}

export function mailTransportOptions(env: Record<string, string | undefined>): SMTPTransport.Options {
  const host = env.SMTP_HOST || "127.0.0.1";
  const secure = env.SMTP_SECURE === "true";
  const auth = env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined;
  const plainAllowed = isLoopbackHost(host) && !auth;
  return {
    host,
    port: Number(env.SMTP_PORT || (secure ? 465 : 1025)),
    secure,
    requireTLS: !secure && !plainAllowed,
    auth,
    connectionTimeout: 5_000,
    socketTimeout: 10_000,
  };
}
