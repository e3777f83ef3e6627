import { z } from "zod";

export const ROLES = ["admin", "engineer", "support", "customer"] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Vendor admin",
  engineer: "Applications engineer",
  support: "Support staff",
  customer: "Customer",
};

export const STAFF_ROLES: readonly Role[] = ["admin", "engineer", "support"];
