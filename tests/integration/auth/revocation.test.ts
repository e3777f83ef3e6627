import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET as listMachinesRoute } from "@/app/api/v1/vendors/[vendor]/machines/route";
import { userForApiToken } from "@/lib/auth/api-tokens";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { sessionUserFor } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { removeMember } from "@/lib/members/change-member";
import { changePassword } from "@/lib/users/change-password";
import { joinAsCustomer } from "@/lib/users/sign-up-customer";
import { createVendorWithStaff, FACTORY_PASSWORD } from "@/tests/factories/foundation";

const epochOf = async (userId: string) => (await db("users").where({ id: userId }).first("session_epoch"))?.session_epoch as number;
const callWith = (slug: string, bearer: string) =>
  listMachinesRoute(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/machines`, {
      headers: { authorization: `Bearer ${bearer}`, "x-swarfbook-peer": "10.61.0.1" },
    }),
    {
      params: Promise.resolve({ vendor: slug }),
    },
  );

describe("API tokens of removed members", () => {
  it("stop working when the member is removed, and do not come back on rejoining", async () => {
    const v = await createVendorWithStaff();
    const { secret } = await createPersonalToken({ vendorId: v.vendor.id, userId: v.customer.user.id, name: "cnc script" });
    expect((await callWith(v.vendor.slug, secret)).status).toBe(200);
    await removeMember({ vendorId: v.vendor.id, actorUserId: v.admin.user.id, memberId: v.customer.memberId });
    expect(await userForApiToken(secret, v.vendor.id)).toBeNull();
    expect((await callWith(v.vendor.slug, secret)).status).toBe(404);
    await joinAsCustomer({ vendorId: v.vendor.id, userId: v.customer.user.id });
    expect(await userForApiToken(secret, v.vendor.id)).toBeNull();
    expect((await callWith(v.vendor.slug, secret)).status).toBe(404);
    // A token made in the new membership works.
    const fresh = await createPersonalToken({ vendorId: v.vendor.id, userId: v.customer.user.id, name: "new script" });
    expect((await callWith(v.vendor.slug, fresh.secret)).status).toBe(200);
  });

  it("a token whose membership row was deleted behind the app's back does not work either", async () => {
    const v = await createVendorWithStaff();
    const { secret } = await createPersonalToken({ vendorId: v.vendor.id, userId: v.engineer.user.id, name: "x" });
    await db("members").where({ id: v.engineer.memberId }).delete();
    await db("members").insert({
      vendor_id: v.vendor.id,
      user_id: v.engineer.user.id,
      role: "admin",
      created_at: new Date(Date.now() + 1000),
    });
    expect(await userForApiToken(secret, v.vendor.id)).toBeNull();
  });

  it("a removed member's token is a 404 at another vendor too (it never was valid there)", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const { secret } = await createPersonalToken({ vendorId: a.vendor.id, userId: a.support.user.id, name: "x" });
    await removeMember({ vendorId: a.vendor.id, actorUserId: a.admin.user.id, memberId: a.support.memberId });
    expect((await callWith(b.vendor.slug, secret)).status).toBe(404);
    expect((await callWith(a.vendor.slug, secret)).status).toBe(404);
  });
});

describe("sessions end", () => {
  it("when the member is removed from a vendor", async () => {
    const v = await createVendorWithStaff();
    const session = { id: v.support.user.id, epoch: await epochOf(v.support.user.id) };
    await expect(sessionUserFor(session)).resolves.toMatchObject({ id: v.support.user.id });
    await removeMember({ vendorId: v.vendor.id, actorUserId: v.admin.user.id, memberId: v.support.memberId });
    await expect(sessionUserFor(session)).resolves.toBeNull();
    // A new sign-in gets the new epoch and works.
    await expect(sessionUserFor({ id: v.support.user.id, epoch: await epochOf(v.support.user.id) })).resolves.toMatchObject({
      id: v.support.user.id,
    });
  });

  it("when the password is changed", async () => {
    const v = await createVendorWithStaff();
    const session = { id: v.engineer.user.id, epoch: await epochOf(v.engineer.user.id) };
    await expect(
      changePassword({ userId: v.engineer.user.id, currentPassword: "wrong", newPassword: "a-new-long-password" }),
    ).rejects.toThrow("not right");
    await expect(sessionUserFor(session)).resolves.not.toBeNull();
    await changePassword({ userId: v.engineer.user.id, currentPassword: FACTORY_PASSWORD, newPassword: "a-new-long-password" });
    await expect(sessionUserFor(session)).resolves.toBeNull();
  });

  it("a session issued before epochs existed counts as epoch 0", async () => {
    const v = await createVendorWithStaff();
    await expect(sessionUserFor({ id: v.customer.user.id })).resolves.toMatchObject({ id: v.customer.user.id });
  });
});
