"use server";

import { redirect } from "next/navigation";
import { z } from "zod";

import { DomainError } from "@/lib/errors/domain-errors";
import { confirmEmail } from "@/lib/users/confirm-email";

const confirmSchema = z.object({ token: z.string().min(10).max(400), vendor: z.string().regex(/^[a-z0-9-]{1,60}$/).optional().catch(undefined) });

// The link only shows a button; the address is confirmed by this POST, so a mail scanner that follows links
// confirms nothing.
export async function confirmEmailAction(form: FormData): Promise<void> {
  const parsed = confirmSchema.safeParse({ token: form.get("token"), vendor: form.get("vendor") || undefined });
  const vendor = parsed.success && parsed.data.vendor ? `&vendor=${parsed.data.vendor}` : "";
  let ok = false;
  if (parsed.success) {
    try {
      await confirmEmail({ token: parsed.data.token });
      ok = true;
    } catch (error) {
      if (!(error instanceof DomainError)) throw error;
    }
  }
  redirect(`/verify-email?${ok ? "done=1" : "failed=1"}${vendor}`);
}
