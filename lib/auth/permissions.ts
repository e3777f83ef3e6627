import type { Role } from "./roles";

// Who may do what, as data. "visitor" is anyone (signed in or not) on a public Library.
export const PERMISSIONS = {
  "library.read": ["admin", "engineer", "support", "customer"],
  "bench.use": ["customer", "admin", "engineer", "support"],
  "support.use": ["customer"],
  "sheets.author": ["engineer", "admin"],
  "sheets.review": ["engineer", "admin"],
  "sheets.publish": ["engineer", "admin"],
  "catalogue.edit": ["engineer", "admin"],
  "field.read": ["engineer", "admin"],
  "desk.use": ["support", "admin"],
  "members.manage": ["admin"],
  "vendor.settings": ["admin"],
  "audit.read": ["admin"],
  "integrations.manage": ["admin"],
  "tokens.manage": ["admin", "engineer", "support", "customer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  return role != null && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

// The areas of the vendor shell and the permission each needs.
export const AREAS = [
  { key: "library", label: "Library", href: "library", permission: "library.read" },
  { key: "bench", label: "Bench", href: "bench", permission: "bench.use" },
  { key: "support", label: "Support", href: "support", permission: "support.use" },
  { key: "drafting", label: "Drafting", href: "drafting", permission: "sheets.author" },
  { key: "desk", label: "Desk", href: "desk", permission: "desk.use" },
  { key: "admin", label: "Admin", href: "admin", permission: "members.manage" },
] as const satisfies readonly { key: string; label: string; href: string; permission: Permission }[];
