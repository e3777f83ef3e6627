import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";
import { acceptInvitation } from "@/lib/members/accept-invitation";
import { changeMemberRole, removeMember } from "@/lib/members/change-member";
import { inviteMember } from "@/lib/members/invite-member";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

async function invite(v: Awaited<ReturnType<typeof createVendorWithStaff>>, email = `${uniq("new")}@example.test`) {
  const { token } = await inviteMember({
    vendorId: v.vendor.id,
    vendorSlug: v.vendor.slug,
    vendorName: v.vendor.name,
    actorUserId: v.admin.user.id,
    email,
    role: "engineer",
  });
  return { token, email };
}

describe("staff invitations", () => {
  it("creates the account and membership once, and the link is single use", async () => {
    const v = await createVendorWithStaff();
    const { token, email } = await invite(v);
    const result = await acceptInvitation({
      vendorId: v.vendor.id,
      token,
      name: "New Engineer",
      password: "a-long-password",
      sessionUserId: null,
    });
    expect(result).toMatchObject({ email, role: "engineer" });
    const member = mustExist(await db("members").where({ vendor_id: v.vendor.id, user_id: result.userId }).first(), "member");
    expect(member.role).toBe("engineer");
    await expect(
      acceptInvitation({ vendorId: v.vendor.id, token, name: "Again", password: "a-long-password", sessionUserId: null }),
    ).rejects.toBeInstanceOf(NotFound);
    const audit = await db("audit_log").where({ vendor_id: v.vendor.id }).pluck("action");
    expect(audit).toEqual(expect.arrayContaining(["member.invite", "member.join"]));
  });

  it("refuses an expired link and a link used at another vendor", async () => {
    const v = await createVendorWithStaff();
    const other = await createVendorWithStaff();
    const { token } = await invite(v);
    await expect(
      acceptInvitation({ vendorId: other.vendor.id, token, name: "X", password: "a-long-password", sessionUserId: null }),
    ).rejects.toBeInstanceOf(NotFound);
    await db("invitations")
      .where({ vendor_id: v.vendor.id })
      .update({ expires_at: new Date(Date.now() - 1000) });
    await expect(
      acceptInvitation({ vendorId: v.vendor.id, token, name: "X", password: "a-long-password", sessionUserId: null }),
    ).rejects.toBeInstanceOf(NotFound);
  });

  it("queues the invitation e-mail with the link", async () => {
    const v = await createVendorWithStaff();
    const { token, email } = await invite(v);
    const jobs = await db("pgboss.job").where({ name: "mail.send" }).whereRaw("data->>'to' = ?", [email]).select("data");
    expect(jobs).toHaveLength(1);
    expect(jobs[0].data.text).toContain(`/${v.vendor.slug}/join/${token}`);
  });

  it("refuses to invite an existing member", async () => {
    const v = await createVendorWithStaff();
    await expect(invite(v, v.support.user.email)).rejects.toBeInstanceOf(Conflict);
  });
});

describe("member roles", () => {
  it("changes a role with an audit entry and keeps at least one admin", async () => {
    const v = await createVendorWithStaff();
    await changeMemberRole({ vendorId: v.vendor.id, actorUserId: v.admin.user.id, memberId: v.support.memberId, role: "engineer" });
    expect((await db("members").where({ id: v.support.memberId }).first())?.role).toBe("engineer");
    const entry = mustExist(
      await db("audit_log").where({ vendor_id: v.vendor.id, action: "member.role", object_id: v.support.memberId }).first(),
      "entry",
    );
    expect(entry.details).toEqual({ from: "support", to: "engineer" });
    await expect(
      changeMemberRole({ vendorId: v.vendor.id, actorUserId: v.admin.user.id, memberId: v.admin.memberId, role: "customer" }),
    ).rejects.toBeInstanceOf(Conflict);
    await expect(removeMember({ vendorId: v.vendor.id, actorUserId: v.admin.user.id, memberId: v.admin.memberId })).rejects.toBeInstanceOf(
      Conflict,
    );
  });

  it("cannot touch a member of another vendor", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    await expect(
      removeMember({ vendorId: a.vendor.id, actorUserId: a.admin.user.id, memberId: b.customer.memberId }),
    ).rejects.toBeInstanceOf(NotFound);
    await expect(
      changeMemberRole({ vendorId: a.vendor.id, actorUserId: a.admin.user.id, memberId: b.customer.memberId, role: "admin" }),
    ).rejects.toBeInstanceOf(NotFound);
    expect(await db("members").where({ id: b.customer.memberId }).first()).toBeTruthy();
  });
});
