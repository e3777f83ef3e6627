import nodemailer from "nodemailer";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { isLoopbackHost, mailTransportOptions } from "@/lib/mail/transport-options";

describe("mailTransportOptions", () => {
  it("never turns STARTTLS off", () => {
    for (const env of [{}, { SMTP_HOST: "smtp.example.com" }, { SMTP_HOST: "127.0.0.1", SMTP_USER: "u" }, { SMTP_SECURE: "true" }]) {
      expect(mailTransportOptions(env).ignoreTLS).toBeFalsy();
    }
  });

  it("uses STARTTLS when offered and allows plain SMTP to a loopback relay without credentials", () => {
    expect(mailTransportOptions({ SMTP_HOST: "127.0.0.1", SMTP_PORT: "1025" })).toMatchObject({
      host: "127.0.0.1",
      port: 1025,
      secure: false,
      requireTLS: false,
      auth: undefined,
    });
    expect(mailTransportOptions({})).toMatchObject({ host: "127.0.0.1", requireTLS: false });
    expect(mailTransportOptions({ SMTP_HOST: "localhost" }).requireTLS).toBe(false);
    expect(mailTransportOptions({ SMTP_HOST: "::1" }).requireTLS).toBe(false);
  });

  it("requires STARTTLS when credentials are set, even on loopback", () => {
    expect(
      mailTransportOptions({ SMTP_HOST: "smtp.example.com", SMTP_PORT: "587", SMTP_USER: "mailer", SMTP_PASSWORD: "pw" }),
    ).toMatchObject({
      secure: false,
      requireTLS: true,
      auth: { user: "mailer", pass: "pw" },
    });
    expect(mailTransportOptions({ SMTP_HOST: "127.0.0.1", SMTP_USER: "mailer" }).requireTLS).toBe(true);
  });

  it("requires STARTTLS to any relay off this machine", () => {
    expect(mailTransportOptions({ SMTP_HOST: "smtp.example.com", SMTP_PORT: "25" }).requireTLS).toBe(true);
    expect(mailTransportOptions({ SMTP_HOST: "10.0.0.5" }).requireTLS).toBe(true);
    expect(mailTransportOptions({ SMTP_HOST: "localhost.example.com" }).requireTLS).toBe(true);
  });

  it("keeps implicit TLS for SMTP_SECURE=true", () => {
    expect(mailTransportOptions({ SMTP_HOST: "smtp.example.com", SMTP_SECURE: "true", SMTP_USER: "u" })).toMatchObject({
      secure: true,
      port: 465,
      requireTLS: false,
    });
  });

  it("knows which hosts are loopback", () => {
    expect(["127.0.0.1", "127.1.2.3", "localhost", "LOCALHOST", "::1", "[::1]", "::ffff:127.0.0.1"].every(isLoopbackHost)).toBe(true);
    expect(["128.0.0.1", "10.0.0.1", "localhost.example.com", "example.com", "::2", "0.0.0.0"].some(isLoopbackHost)).toBe(false);
  });
});

// A relay that offers no STARTTLS: credentials must never be sent to it in clear text.
describe("against a relay without STARTTLS", () => {
  let server: SMTPServer;
  let port = 0;
  const logins: string[] = [];
  beforeAll(async () => {
    server = new SMTPServer({
      disabledCommands: ["STARTTLS"],
      allowInsecureAuth: true,
      authOptional: true,
      logger: false,
      onAuth: (auth, _session, done) => {
        logins.push(auth.username ?? "");
        done(null, { user: auth.username });
      },
      onData: (stream, _session, done) => {
        stream.resume();
        stream.on("end", () => done());
      },
    });
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    const address = server.server.address();
    port = typeof address === "object" && address ? address.port : 0;
  });
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  const send = (env: Record<string, string>) =>
    nodemailer
      .createTransport(mailTransportOptions({ SMTP_HOST: "127.0.0.1", SMTP_PORT: String(port), ...env }))
      .sendMail({ from: "a@example.test", to: "b@example.test", subject: "s", text: "t" });

  it("refuses to send credentials without TLS", async () => {
    await expect(send({ SMTP_USER: "mailer", SMTP_PASSWORD: "secret" })).rejects.toThrow(/STARTTLS|TLS/i);
    expect(logins).toEqual([]);
  });

  it("still delivers to a loopback relay without credentials", async () => {
    await expect(send({})).resolves.toMatchObject({ accepted: ["b@example.test"] });
  });
});
