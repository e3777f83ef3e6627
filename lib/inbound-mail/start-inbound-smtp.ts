import "server-only";

import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

import { handleInboundMail } from "./handle-inbound-mail";

const MAX_BYTES = 12 * 1024 * 1024;

/** The loopback SMTP listener that receives replies to ticket notifications. */
export async function startInboundSmtp({
  host = "127.0.0.1",
  port = Number(process.env.INBOUND_SMTP_PORT ?? 2525),
} = {}): Promise<SMTPServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["AUTH", "STARTTLS"],
    size: MAX_BYTES,
    banner: "Swarfbook inbound reply listener",
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("end", () => {
        void (async () => {
          try {
            if (stream.sizeExceeded) return callback(Object.assign(new Error("Message too large"), { responseCode: 552 }));
            const parsed = await simpleParser(Buffer.concat(chunks));
            const from = parsed.from?.value[0]?.address || (session.envelope.mailFrom ? session.envelope.mailFrom.address : "");
            const attachments = parsed.attachments.map((a) => ({ fileName: a.filename ?? "attachment", content: a.content }));
            const authenticationResults = parsed.headerLines
              .filter((h) => h.key === "authentication-results")
              .map((h) => h.line.replace(/^[^:]*:/, ""));
            await handleInboundMail({
              rcptTo: session.envelope.rcptTo.map((r) => r.address),
              from,
              text: parsed.text ?? "",
              attachments,
              messageId: parsed.messageId,
              authenticationResults,
            });
            callback();
          } catch (error) {
            // 451 (try again later) only while nothing was stored; handleInboundMail answers normally after that.
            console.error("[inbound-mail]", error);
            callback(Object.assign(new Error("Temporary failure"), { responseCode: 451 }));
          }
        })();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => resolve());
  });
  server.on("error", (error) => console.error("[inbound-mail]", error));
  return server;
}

const globalForSmtp = globalThis as unknown as { swarfbookInboundSmtp?: Promise<SMTPServer | null> };

/** Starts the listener once per process unless INBOUND_SMTP=off (called from instrumentation.ts). */
export function startInboundSmtpOnce(): Promise<SMTPServer | null> {
  if (process.env.INBOUND_SMTP === "off") return Promise.resolve(null);
  globalForSmtp.swarfbookInboundSmtp ??= startInboundSmtp().catch((error: unknown) => {
    console.error("[inbound-mail] listener failed to start", error);
    return null;
  });
  return globalForSmtp.swarfbookInboundSmtp;
}
