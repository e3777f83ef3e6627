"use server";

import { revalidatePath } from "next/cache";

import { createVendorSchema } from "@/content-schema/vendor-create";
import type { ActionState } from "@/lib/actions/action-state";
import { findSessionUser } from "@/lib/auth/session-user";
import { DomainError } from "@/lib/errors/domain-errors";
import { fieldErrorsOf } from "@/lib/errors/zod-field-errors";
import { createVendor } from "@/lib/vendors/create-vendor";

export async function createVendorAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await findSessionUser();
  if (!user?.isOperator) return { ok: false, message: "Not found." };
  const values = Object.fromEntries([...form.entries()].filter(([, v]) => typeof v === "string")) as Record<string, string>;
  const parsed = createVendorSchema.safeParse(values);
  if (!parsed.success) return { ok: false, message: "Please correct the marked fields.", errors: fieldErrorsOf(parsed.error), values };
  try {
    await createVendor({ actorUserId: user.id, ...parsed.data });
  } catch (error) {
    if (error instanceof DomainError)
      return { ok: false, message: error.message, values, errors: error.code === "conflict" ? { slug: [error.message] } : undefined };
    throw error;
  }
  revalidatePath("/operator");
  return { ok: true, message: `Workspace /${parsed.data.slug} created; the invitation went to ${parsed.data.adminEmail}.` };
}
