"use server";

import { redirect } from "next/navigation";

import { changePasswordSchema } from "@/content-schema/auth";
import type { ActionState } from "@/lib/actions/action-state";
import { findSessionUser } from "@/lib/auth/session-user";
import { DomainError } from "@/lib/errors/domain-errors";
import { fieldErrorsOf } from "@/lib/errors/zod-field-errors";
import { consumeRateLimit } from "@/lib/rate-limit/consume-rate-limit";
import { changePassword } from "@/lib/users/change-password";
import { endSessions } from "@/lib/users/end-sessions";

export async function changePasswordAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await findSessionUser();
  if (!user) return { ok: false, message: "Your session has ended. Sign in again to change your password." };
  const parsed = changePasswordSchema.safeParse(Object.fromEntries(form.entries()));
  if (!parsed.success) return { ok: false, message: "Please correct the marked fields.", errors: fieldErrorsOf(parsed.error) };
  try {
    // Guessing the current password from a stolen session is slowed to a few tries an hour.
    await consumeRateLimit({ key: `change-password:${user.id}`, limit: 10, windowSeconds: 3600 });
    await changePassword({ userId: user.id, currentPassword: parsed.data.currentPassword, newPassword: parsed.data.newPassword });
  } catch (error) {
    if (error instanceof DomainError) return { ok: false, message: error.message, errors: error.fieldErrors };
    throw error;
  }
  return { ok: true, message: "Password changed. Every session of yours has ended, this one too: sign in with the new password." };
}

/** Ends every session of the signed-in person, on every device; they sign in again here. */
export async function endAllSessionsAction(): Promise<void> {
  const user = await findSessionUser();
  if (user) await endSessions(user.id);
  redirect("/sign-in?callbackUrl=/account");
}
