import "server-only";

import nodemailer, { type Transporter } from "nodemailer";

export const MAIL_FROM = process.env.MAIL_FROM ?? "Swarfbook <no-reply@swarfbook.localhost>";

let transporter: Transporter | null = null;

export function mailTransport(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? "127.0.0.1",
    port: Number(process.env.SMTP_PORT ?? 1025),
    secure: process.env.SMTP_SECURE === "true",
    ignoreTLS: process.env.SMTP_SECURE !== "true",
    auth: process.env.SMTP_USER ? { user: process.env.SMTP_USER, pass: process.env.SMTP_PASSWORD ?? "" } : undefined,
    connectionTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return transporter;
}
