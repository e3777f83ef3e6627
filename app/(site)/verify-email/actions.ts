"use server";

import { redirect } from "next/navigation";
import { z } from "zod";

import { DomainError } from "@/lib/errors/domain-errors";
import { confirmEmail } from "@/lib/users/confirm-email";

const confirmSchema = z.object({
  token: z.string().min(10).max(400),
  password: z.string().min(1).max(200),
  vendor: z
    .string()
    .regex(/^[a-z0-9-]{1,60}$/)
    .optional()
    .catch(undefined),
});

// The link only shows a button; the address is confirmed by this POST, so a mail scanner that follows links
// confirms nothing.
export async function confirmEmailAction(form: FormData): Promise<void> {
  const parsed = confirmSchema.safeParse({
    token: form.get("token"),
    password: form.get("password"),
    vendor: form.get("vendor") || undefined,
  });
  const vendor = parsed.success && parsed.data.vendor ? `&vendor=${parsed.data.vendor}` : "";
  let outcome = "failed=1";
  if (parsed.success) {
    try {
      await confirmEmail({ token: parsed.data.token, password: parsed.data.password });
      outcome = "done=1";
    } catch (error) {
      if (!(error instanceof DomainError)) throw error;
      // A wrong password keeps the link on the page so the person can try again.
      if (error.fieldErrors?.password) outcome = `token=${encodeURIComponent(parsed.data.token)}&wrong=1`;
    }
  }
  redirect(`/verify-email?${outcome}${vendor}`);
}
