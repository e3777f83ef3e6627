import "server-only";

import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

export type Account = {
  email: string;
  name: string;
  hasPassword: boolean;
  memberships: { vendorSlug: string; vendorName: string; roleLabel: string }[];
};

/** The signed-in person's own account: who they are and which vendors they belong to. */
export async function getAccount(userId: string): Promise<Account> {
  const user = await db("users")
    .where({ id: userId })
    .first<{ email: string; name: string; has_password: boolean } | undefined>(
      "email",
      "name",
      db.raw("password_hash is not null as has_password"),
    );
  if (!user) throw new NotFound();
  const memberships = await db("members as m")
    .join("vendors as v", "v.id", "m.vendor_id")
    .where({ "m.user_id": userId })
    .orderBy("v.name")
    .select<{ slug: string; name: string; role: Role }[]>("v.slug", "v.name", "m.role");
  return {
    email: user.email,
    name: user.name,
    hasPassword: user.has_password,
    memberships: memberships.map((m) => ({ vendorSlug: m.slug, vendorName: m.name, roleLabel: ROLE_LABELS[m.role] })),
  };
}
