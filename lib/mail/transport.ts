import "server-only";

import nodemailer, { type Transporter } from "nodemailer";

import { MAIL_SEND_CONCURRENCY } from "./send-concurrency";
import { mailTransportOptions } from "./transport-options";

export const MAIL_FROM = process.env.MAIL_FROM ?? "Swarfbook <no-reply@swarfbook.localhost>";

let transporter: Transporter | null = null;

export function mailTransport(): Transporter {
  // Pooled: a backlog of mail reuses a few relay connections instead of opening one per message.
  transporter ??= nodemailer.createTransport({ ...mailTransportOptions(process.env), pool: true, maxConnections: MAIL_SEND_CONCURRENCY });
  return transporter;
}
