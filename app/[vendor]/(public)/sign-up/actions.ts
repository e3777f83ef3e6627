"use server";

import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";

import { signUpSchema } from "@/content-schema/auth";
import type { ActionState } from "@/lib/actions/action-state";
import { findSessionUser } from "@/lib/auth/session-user";
import { DomainError } from "@/lib/errors/domain-errors";
import { fieldErrorsOf } from "@/lib/errors/zod-field-errors";
import { clientIp } from "@/lib/http/client-ip";
import { consumeRateLimit } from "@/lib/rate-limit/consume-rate-limit";
import { joinAsCustomer, signUpCustomer } from "@/lib/users/sign-up-customer";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

const vendorField = z.object({ vendor: z.string().max(60) });

export async function signUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = { name: String(form.get("name") ?? ""), email: String(form.get("email") ?? "") };
  const field = vendorField.safeParse({ vendor: form.get("vendor") });
  const vendor = field.success ? await findVendorBySlug(field.data.vendor) : null;
  if (!vendor)
    return { ok: false, message: "This sign-up form names no vendor we know. Open the sign-up page from the vendor's Library.", values };
  const parsed = signUpSchema.safeParse(Object.fromEntries(form.entries()));
  if (!parsed.success) return { ok: false, message: "Please correct the marked fields.", errors: fieldErrorsOf(parsed.error), values };
  try {
    await consumeRateLimit({ key: `sign-up:${clientIp(await headers())}`, limit: 10, windowSeconds: 3600 });
    await signUpCustomer({ vendorId: vendor.id, vendorSlug: vendor.slug, ...parsed.data });
  } catch (error) {
    if (error instanceof DomainError) return { ok: false, message: error.message, values };
    throw error;
  }
  return {
    ok: true,
    message: `Almost done: we sent a link to ${parsed.data.email}. Open it to confirm the address, then sign in with your password.`,
    values: { email: parsed.data.email },
  };
}

export async function joinAsCustomerAction(form: FormData): Promise<void> {
  const vendor = await findVendorBySlug(String(form.get("vendor") ?? ""));
  const user = await findSessionUser();
  if (!vendor || !user) redirect("/sign-in");
  await joinAsCustomer({ vendorId: vendor.id, userId: user.id });
  redirect(`/${vendor.slug}/bench`);
}
