"use server";

import { headers } from "next/headers";
import { z } from "zod";

import { emailSchema } from "@/content-schema/auth";
import type { ActionState } from "@/lib/actions/action-state";
import { RateLimited } from "@/lib/errors/domain-errors";
import { clientIp } from "@/lib/http/client-ip";
import { resendVerification } from "@/lib/users/resend-verification";

const resendSchema = z.object({ email: emailSchema, vendor: z.string().max(60).optional() });

export async function resendVerificationAction(raw: { email: string; vendor?: string }): Promise<ActionState> {
  const parsed = resendSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, message: "Enter a valid e-mail address." };
  try {
    await resendVerification({ email: parsed.data.email, ip: clientIp(await headers()), vendorSlug: parsed.data.vendor });
  } catch (error) {
    if (error instanceof RateLimited) return { ok: false, message: "Too many links were asked for. Wait an hour and try again." };
    throw error;
  }
  // The same answer whether or not the address has an unconfirmed account.
  return { ok: true, message: `If ${parsed.data.email} has an account waiting for confirmation, a new link is on its way.` };
}
