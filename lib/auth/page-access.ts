import "server-only";

import { notFound, redirect } from "next/navigation";

import { DomainError } from "@/lib/errors/domain-errors";

import { resolveVendorAccess, type VendorAccess } from "./access";
import type { Permission } from "./permissions";
import { findSessionUser } from "./session-user";

/** For layouts and pages: resolve access or answer with a 404 / a sign-in redirect. */
export async function requirePageAccess(vendorSlug: string, permission?: Permission, returnTo?: string): Promise<VendorAccess> {
  const user = await findSessionUser();
  try {
    return await resolveVendorAccess(vendorSlug, user, permission);
  } catch (error) {
    if (error instanceof DomainError && error.code === "unauthenticated") {
      redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo ?? `/${vendorSlug}`)}&vendor=${encodeURIComponent(vendorSlug)}`);
    }
    if (error instanceof DomainError) notFound();
    throw error;
  }
}
