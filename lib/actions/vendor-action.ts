import "server-only";

import type { z } from "zod";

import { resolveVendorAccess, type VendorAccess } from "@/lib/auth/access";
import type { Member } from "@/lib/auth/membership";
import type { Permission } from "@/lib/auth/permissions";
import { findSessionUser, type SessionUser } from "@/lib/auth/session-user";
import { pinReadsToPrimary } from "@/lib/db/read-db";
import { CATCHING_UP, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { DomainError } from "@/lib/errors/domain-errors";
import { fieldErrorsOf } from "@/lib/errors/zod-field-errors";

import type { ActionState } from "./action-state";

export type MemberAccess = VendorAccess & { user: SessionUser; member: Member };

function formValues(input: FormData | Record<string, unknown>): Record<string, unknown> {
  if (!(input instanceof FormData)) return input;
  const out: Record<string, unknown> = {};
  for (const [key, value] of input.entries()) {
    if (key.startsWith("$ACTION")) continue;
    if (key in out) out[key] = ([] as unknown[]).concat(out[key], value);
    else out[key] = value;
  }
  return out;
}

/** The submitted text fields, so a refused form can show them again; repeated fields (checkbox groups) as lists. */
function sentValues(raw: Record<string, unknown>): { values: Record<string, string>; lists: Record<string, string[]> } {
  const values: Record<string, string> = {};
  const lists: Record<string, string[]> = {};
  for (const [key, value] of Object.entries(raw)) {
    if (typeof value === "string") values[key] = value;
    else if (Array.isArray(value)) lists[key] = value.filter((v): v is string => typeof v === "string");
  }
  return { values, lists };
}

// The author's next reads (a redirect to the published page, say) come from the primary, not a lagging replica.
async function pinAfterWrite(run: () => Promise<ActionState | void>): Promise<ActionState | void> {
  try {
    const result = await run();
    if (result?.ok !== false) await pinReadsToPrimary();
    return result;
  } catch (error) {
    // redirect() after a successful write also signals by throwing.
    if (error && typeof error === "object" && "digest" in error && String(error.digest).startsWith("NEXT_REDIRECT"))
      await pinReadsToPrimary();
    throw error;
  }
}

/**
 * The one wrapper for server actions: session, vendor, membership and permission through the
 * access helper, zod parsing of the input, typed errors to `{ ok, message, errors }`.
 * The vendor slug comes from the input's `vendor` field and is checked like any other input.
 */
export function vendorAction<S extends z.ZodType>(
  options: { permission: Permission; schema: S },
  run: (input: z.output<S>, access: MemberAccess) => Promise<ActionState | void>,
) {
  return async (_previous: ActionState, input: FormData | Record<string, unknown>): Promise<ActionState> => {
    const raw = formValues(input);
    const { values, lists } = sentValues(raw);
    try {
      const user = await findSessionUser();
      const access = await resolveVendorAccess(String(raw.vendor ?? ""), user, options.permission);
      if (!access.user || !access.member) return { ok: false, message: "Sign in to continue.", values, lists };
      const parsed = options.schema.safeParse(raw);
      if (!parsed.success)
        return { ok: false, message: "Please correct the marked fields.", errors: fieldErrorsOf(parsed.error), values, lists };
      const result = await pinAfterWrite(() => run(parsed.data, access as MemberAccess));
      return result ?? { ok: true };
    } catch (error) {
      if (error instanceof DomainError) {
        return { ok: false, message: error.code === "not_found" ? "Not found." : error.message, errors: error.fieldErrors, values, lists };
      }
      // Next's redirect() and notFound() signal by throwing; let them through.
      if (error && typeof error === "object" && "digest" in error) throw error;
      if (isDatabaseUnavailable(error)) return { ok: false, message: CATCHING_UP, values, lists };
      console.error("[action]", error);
      // Not "nothing was saved": a failure after the commit (a revalidation, say) leaves the write in place.
      return { ok: false, message: "Something went wrong on our side. Please try again; a form sent twice is saved once.", values, lists };
    }
  };
}
