import { randomBytes } from "node:crypto";
import { hash } from "@node-rs/argon2";

import type { Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";

export const FACTORY_PASSWORD = "factory-password-1";
let passwordHash: Promise<string> | null = null;

export const uniq = (prefix: string) => `${prefix}-${randomBytes(4).toString("hex")}`;

export async function createVendor(overrides: { slug?: string; name?: string; settings?: Record<string, unknown> } = {}) {
  const slug = overrides.slug ?? uniq("v");
  const [row] = await db("vendors")
    .insert({ slug, name: overrides.name ?? `Vendor ${slug}`, settings: JSON.stringify(overrides.settings ?? {}) })
    .returning(["id", "slug", "name"]);
  return row as { id: string; slug: string; name: string };
}

/** A person with a confirmed e-mail (pass `verified: false` for an account that never proved its address). */
export async function createUser(overrides: { email?: string; name?: string; isOperator?: boolean; verified?: boolean } = {}) {
  passwordHash ??= hash(FACTORY_PASSWORD);
  const email = overrides.email ?? `${uniq("u")}@example.test`;
  const [row] = await db("users")
    .insert({
      email,
      name: overrides.name ?? email.split("@")[0],
      password_hash: await passwordHash,
      is_operator: overrides.isOperator ?? false,
      email_verified: overrides.verified === false ? null : db.fn.now(),
    })
    .returning(["id", "email", "name"]);
  return row as { id: string; email: string; name: string };
}

export async function createMember(vendorId: string, role: Role, userOverrides: Parameters<typeof createUser>[0] = {}) {
  const user = await createUser(userOverrides);
  const [member] = await db("members").insert({ vendor_id: vendorId, user_id: user.id, role }).returning("id");
  return { user, memberId: member.id as string, role };
}

/** A vendor with one member of each role, the usual start of an isolation test. */
export async function createVendorWithStaff(overrides: Parameters<typeof createVendor>[0] = {}) {
  const vendor = await createVendor(overrides);
  const [admin, engineer, engineer2, support, customer] = await Promise.all([
    createMember(vendor.id, "admin"),
    createMember(vendor.id, "engineer"),
    createMember(vendor.id, "engineer"),
    createMember(vendor.id, "support"),
    createMember(vendor.id, "customer"),
  ]);
  return { vendor, admin, engineer, engineer2, support, customer };
}
