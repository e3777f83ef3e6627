import { requireMember, type VendorAccess } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { NotFound } from "@/lib/errors/domain-errors";

/** Staff with desk.use read everything of the vendor's tickets; customers with support.use their own. */
export function supportRole(access: VendorAccess): { kind: "staff" | "customer"; userId: string } {
  requireMember(access);
  if (can(access.member.role, "desk.use")) return { kind: "staff", userId: access.user.id };
  if (can(access.member.role, "support.use")) return { kind: "customer", userId: access.user.id };
  throw new NotFound();
}
