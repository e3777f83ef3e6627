import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";
import { inviteMember } from "@/lib/members/invite-member";

/** Platform operator: create a vendor workspace and invite its first admin. */
export async function createVendor(opts: { actorUserId: string; slug: string; name: string; accentColor: string; adminEmail: string }) {
  const clash = await db("vendors").where({ slug: opts.slug }).first("id");
  if (clash) throw new Conflict("That address is taken.");
  const [vendor] = await db("vendors")
    .insert({ slug: opts.slug, name: opts.name, accent_color: opts.accentColor })
    .returning(["id", "slug", "name"]);
  await writeAudit({
    vendorId: vendor.id,
    actorUserId: opts.actorUserId,
    action: "vendor.create",
    objectType: "vendor",
    objectId: vendor.id,
    details: { slug: opts.slug },
  });
  const { token } = await inviteMember({
    vendorId: vendor.id,
    vendorSlug: vendor.slug,
    vendorName: vendor.name,
    actorUserId: opts.actorUserId,
    email: opts.adminEmail,
    role: "admin",
  });
  return { vendorId: vendor.id as string, invitationToken: token };
}
