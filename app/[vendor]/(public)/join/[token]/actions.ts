"use server";

import { acceptInvitationSchema } from "@/content-schema/members";
import type { ActionState } from "@/lib/actions/action-state";
import { findSessionUser } from "@/lib/auth/session-user";
import { DomainError } from "@/lib/errors/domain-errors";
import { fieldErrorsOf } from "@/lib/errors/zod-field-errors";
import { acceptInvitation } from "@/lib/members/accept-invitation";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

export type AcceptedInvitation = { email: string; created: boolean };

export async function acceptInvitationAction(_prev: ActionState, form: FormData): Promise<ActionState<AcceptedInvitation>> {
  const parsed = acceptInvitationSchema.safeParse(Object.fromEntries(form.entries()));
  if (!parsed.success) return { ok: false, message: "Please correct the marked fields.", errors: fieldErrorsOf(parsed.error) };
  const vendor = await findVendorBySlug(parsed.data.vendor);
  if (!vendor) return { ok: false, message: "Not found." };
  const user = await findSessionUser();
  try {
    const result = await acceptInvitation({
      vendorId: vendor.id,
      token: parsed.data.token,
      name: parsed.data.name,
      password: parsed.data.password,
      sessionUserId: user?.id ?? null,
    });
    return { ok: true, message: `Welcome. You joined ${vendor.name}.`, data: { email: result.email, created: result.created } };
  } catch (error) {
    if (error instanceof DomainError) return { ok: false, message: error.message, errors: error.fieldErrors };
    throw error;
  }
}
