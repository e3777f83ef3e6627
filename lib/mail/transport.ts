import "server-only";

import nodemailer, { type Transporter } from "nodemailer";

import { mailTransportOptions } from "./transport-options";

export const MAIL_FROM = process.env.MAIL_FROM ?? "Swarfbook <no-reply@swarfbook.localhost>";

let transporter: Transporter | null = null;

export function mailTransport(): Transporter {
  transporter ??= nodemailer.createTransport(mailTransportOptions(process.env));
  return transporter;
}
