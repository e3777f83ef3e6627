import { describe, expect, it } from "vitest";

import { authorizePassword } from "@/lib/auth/auth-options";
import { createVerificationToken } from "@/lib/auth/email-verification-token";
import { knexAdapter } from "@/lib/auth/knex-adapter";
import { db } from "@/lib/db/knex";
import { Unauthenticated } from "@/lib/errors/domain-errors";
import { acceptInvitation } from "@/lib/members/accept-invitation";
import { inviteMember } from "@/lib/members/invite-member";
import { confirmEmail } from "@/lib/users/confirm-email";
import { RESEND_LIMITS, resendVerification } from "@/lib/users/resend-verification";
import { signUpCustomer } from "@/lib/users/sign-up-customer";
import { createVendor as createVendorWorkspace } from "@/lib/vendors/create-vendor";
import { createUser, createVendorWithStaff, FACTORY_PASSWORD, uniq } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

const ATTACKER_PASSWORD = "attacker-password-1";
const ip = (n: number) => ({ "x-forwarded-for": `10.44.0.${n}` });

async function linkMailedTo(email: string): Promise<string> {
  const [job] = await db("pgboss.job")
    .where({ name: "mail.send" })
    .whereRaw("data->>'to' = ?", [email])
    .whereRaw("data->>'subject' like 'Confirm%'")
    .orderBy("created_on", "desc")
    .select("data");
  const token = /verify-email\?token=([\w.-]+)/.exec(job.data.text)?.[1];
  if (!token) throw new Error("no confirmation link");
  return token;
}

async function roleOf(vendorId: string, email: string) {
  return (
    await db("members as m").join("users as u", "u.id", "m.user_id").where({ "m.vendor_id": vendorId, "u.email": email }).first("m.role")
  )?.role;
}

describe("e-mail confirmation for password accounts", () => {
  it("a new customer cannot sign in with the password until the mailed link confirms the address", async () => {
    const v = await createVendorWithStaff();
    const email = `${uniq("cust")}@example.test`;
    await signUpCustomer({ vendorId: v.vendor.id, vendorSlug: v.vendor.slug, name: "New Customer", email, password: "a-long-password" });
    await expect(authorizePassword({ email, password: "a-long-password" }, ip(1))).rejects.toThrow("email_unverified");
    // A wrong password says nothing about confirmation.
    await expect(authorizePassword({ email, password: "wrong-password" }, ip(1))).resolves.toBeNull();
    await confirmEmail({ token: await linkMailedTo(email), password: "a-long-password" });
    await expect(authorizePassword({ email, password: "a-long-password" }, ip(1))).resolves.toMatchObject({ email });
  });

  it("refuses altered, expired and superseded links", async () => {
    const v = await createVendorWithStaff();
    const email = `${uniq("cust")}@example.test`;
    const { userId } = await signUpCustomer({ vendorId: v.vendor.id, name: "A", email, password: "first-password-1" });
    const first = await linkMailedTo(email);
    await expect(confirmEmail({ token: first.slice(0, -2) + "xx", password: "first-password-1" })).rejects.toThrow("not valid");
    const user = mustExist(await db("users").where({ id: userId }).first("password_hash"), "user");
    const expired = createVerificationToken({ userId, email, passwordHash: user.password_hash, now: Date.now() - 49 * 3_600_000 });
    await expect(confirmEmail({ token: expired, password: "first-password-1" })).rejects.toThrow("not valid");
    // Someone signs up again with the address: the first link no longer confirms (it was for another password).
    await signUpCustomer({ vendorId: v.vendor.id, name: "B", email, password: "second-password-1" });
    await expect(confirmEmail({ token: first, password: "first-password-1" })).rejects.toThrow("not valid");
    expect((await db("users").where({ id: userId }).first("email_verified"))?.email_verified).toBeNull();
  });

  it("sends the link again, rate-limited, and only for unconfirmed accounts", async () => {
    const v = await createVendorWithStaff();
    const email = `${uniq("cust")}@example.test`;
    await signUpCustomer({ vendorId: v.vendor.id, name: "A", email, password: "a-long-password" });
    const count = async () =>
      Number((await db("pgboss.job").where({ name: "mail.send" }).whereRaw("data->>'to' = ?", [email]).count("* as n"))[0].n);
    // The sign-up's own mail counts against the same per-address budget.
    for (let i = 1; i < RESEND_LIMITS.perAccount.limit; i++) await resendVerification({ email, ip: "10.45.0.1" });
    expect(await count()).toBe(RESEND_LIMITS.perAccount.limit);
    await expect(resendVerification({ email, ip: "10.45.0.2" })).rejects.toThrow("Too many");
    const confirmed = await createUser();
    await resendVerification({ email: confirmed.email, ip: "10.45.0.3" });
    expect(await db("pgboss.job").where({ name: "mail.send" }).whereRaw("data->>'to' = ?", [confirmed.email]).first()).toBeUndefined();
  });

  it("signing up again and again with an unconfirmed address does not mail it without end", async () => {
    const v = await createVendorWithStaff();
    const email = `victim-${uniq("x")}@example.test`;
    for (let i = 0; i < RESEND_LIMITS.perAccount.limit; i++)
      await signUpCustomer({ vendorId: v.vendor.id, name: "Spam", email, password: `spam-password-${i}` });
    await expect(signUpCustomer({ vendorId: v.vendor.id, name: "Spam", email, password: "spam-password-x" })).rejects.toThrow("Too many");
    await expect(resendVerification({ email, ip: "10.45.0.9" })).rejects.toThrow("Too many");
    const mails = await db("pgboss.job").where({ name: "mail.send" }).whereRaw("data->>'to' = ?", [email]).count("* as n");
    expect(Number(mails[0].n)).toBe(RESEND_LIMITS.perAccount.limit);
  });

  it("a magic link proves the address but drops a password that was never confirmed", async () => {
    const user = await createUser({ verified: false });
    await knexAdapter.updateUser!({ id: user.id, emailVerified: new Date() });
    const row = mustExist(await db("users").where({ id: user.id }).first("email_verified", "password_hash"), "row");
    expect(row.email_verified).not.toBeNull();
    expect(row.password_hash).toBeNull();
    const confirmed = await createUser();
    await knexAdapter.updateUser!({ id: confirmed.id, emailVerified: new Date() });
    await expect(authorizePassword({ email: confirmed.email, password: FACTORY_PASSWORD }, ip(2))).resolves.toMatchObject({
      id: confirmed.id,
    });
  });
});

describe("pre-registration takeover of an invited account", () => {
  it("an attacker who signs up first with the invitee's address gets neither a sign-in nor the role; the invitee does", async () => {
    const v = await createVendorWithStaff();
    const email = `newhire-${uniq("x")}@example.test`;
    // 1. The attacker signs up with the address before the invitation.
    await signUpCustomer({ vendorId: v.vendor.id, name: "Not the new hire", email, password: ATTACKER_PASSWORD });
    // 2. The admin invites the real person.
    const { token } = await inviteMember({
      vendorId: v.vendor.id,
      vendorSlug: v.vendor.slug,
      vendorName: v.vendor.name,
      actorUserId: v.admin.user.id,
      email,
      role: "admin",
    });
    // 3. The attacker cannot sign in: the address was never confirmed.
    await expect(authorizePassword({ email, password: ATTACKER_PASSWORD }, ip(3))).rejects.toThrow("email_unverified");
    // 4. The attacker does not have the invitation link; the role is not attached by sign-up or by the invitation alone.
    expect(await roleOf(v.vendor.id, email)).toBe("customer");
    // 5. The invitee opens the mailed link and chooses a password: the account becomes theirs, with the role.
    const result = await acceptInvitation({
      vendorId: v.vendor.id,
      token,
      name: "Real New Hire",
      password: "the-real-password",
      sessionUserId: null,
    });
    expect(result.created).toBe(true);
    expect(await roleOf(v.vendor.id, email)).toBe("admin");
    await expect(authorizePassword({ email, password: "the-real-password" }, ip(4))).resolves.toMatchObject({ email });
    // 6. The attacker's password never works.
    await expect(authorizePassword({ email, password: ATTACKER_PASSWORD }, ip(5))).resolves.toBeNull();
    // …and the link the attacker could have had mailed does not confirm anything any more.
    await expect(confirmEmail({ token: await linkMailedTo(email), password: ATTACKER_PASSWORD })).rejects.toThrow("not valid");
  });

  it("the invitee clicking the squatter's confirmation link does not confirm the squatter's password", async () => {
    const v = await createVendorWithStaff();
    const email = `newhire-${uniq("x")}@example.test`;
    await signUpCustomer({ vendorId: v.vendor.id, name: "Not the new hire", email, password: ATTACKER_PASSWORD });
    // The invitee receives "Confirm your e-mail" and tries to confirm; they do not know the squatter's password.
    const link = await linkMailedTo(email);
    await expect(confirmEmail({ token: link, password: "the-real-password" })).rejects.toThrow("not the password");
    await expect(confirmEmail({ token: link, password: "" })).rejects.toThrow("not the password");
    expect((await db("users").where({ email }).first("email_verified"))?.email_verified).toBeNull();
    // The invitee accepts the admin invitation; the squatter's password still does not sign in.
    const { token } = await inviteMember({
      vendorId: v.vendor.id,
      vendorSlug: v.vendor.slug,
      vendorName: v.vendor.name,
      actorUserId: v.admin.user.id,
      email,
      role: "admin",
    });
    await acceptInvitation({ vendorId: v.vendor.id, token, name: "Real New Hire", password: "the-real-password", sessionUserId: null });
    expect(await roleOf(v.vendor.id, email)).toBe("admin");
    await expect(authorizePassword({ email, password: ATTACKER_PASSWORD }, ip(9))).resolves.toBeNull();
    await expect(authorizePassword({ email, password: "the-real-password" }, ip(9))).resolves.toMatchObject({ email });
  });

  it("the operator's first-admin invitation is protected the same way", async () => {
    const operator = await createUser({ isOperator: true });
    const email = `founder-${uniq("x")}@example.test`;
    const other = await createVendorWithStaff();
    await signUpCustomer({ vendorId: other.vendor.id, name: "Squatter", email, password: ATTACKER_PASSWORD });
    const { vendorId, invitationToken } = await createVendorWorkspace({
      actorUserId: operator.id,
      slug: uniq("ws"),
      name: "New Workspace",
      accentColor: "#2f5d8a",
      adminEmail: email,
    });
    await expect(authorizePassword({ email, password: ATTACKER_PASSWORD }, ip(6))).rejects.toThrow("email_unverified");
    expect(await roleOf(vendorId, email)).toBeUndefined();
    await acceptInvitation({ vendorId, token: invitationToken, name: "Founder", password: "founder-password", sessionUserId: null });
    expect(await roleOf(vendorId, email)).toBe("admin");
    await expect(authorizePassword({ email, password: ATTACKER_PASSWORD }, ip(7))).resolves.toBeNull();
  });

  it("a confirmed account accepts only while signed in as itself, and keeps its password", async () => {
    const v = await createVendorWithStaff();
    const existing = await createUser();
    const { token } = await inviteMember({
      vendorId: v.vendor.id,
      vendorSlug: v.vendor.slug,
      vendorName: v.vendor.name,
      actorUserId: v.admin.user.id,
      email: existing.email,
      role: "engineer",
    });
    await expect(
      acceptInvitation({ vendorId: v.vendor.id, token, name: "X", password: "replaced-password", sessionUserId: null }),
    ).rejects.toBeInstanceOf(Unauthenticated);
    await expect(acceptInvitation({ vendorId: v.vendor.id, token, sessionUserId: v.support.user.id })).rejects.toBeInstanceOf(
      Unauthenticated,
    );
    expect(await roleOf(v.vendor.id, existing.email)).toBeUndefined();
    // The refused attempts did not use the invitation up.
    const result = await acceptInvitation({ vendorId: v.vendor.id, token, sessionUserId: existing.id });
    expect(result).toMatchObject({ created: false, role: "engineer" });
    await expect(authorizePassword({ email: existing.email, password: FACTORY_PASSWORD }, ip(8))).resolves.toMatchObject({
      id: existing.id,
    });
  });
});
