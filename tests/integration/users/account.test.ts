import { beforeEach, describe, expect, it, vi } from "vitest";

import { changePasswordAction, endAllSessionsAction } from "@/app/(site)/account/actions";
import { initialActionState } from "@/lib/actions/action-state";
import { verifyPassword } from "@/lib/auth/passwords";
import type { SessionUser } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { getAccount } from "@/lib/users/get-account";
import { createVendorWithStaff, FACTORY_PASSWORD } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => session.user }));

const formOf = (fields: Record<string, string>) => {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return form;
};
const userRow = async (id: string) => mustExist(await db("users").where({ id }).first("password_hash", "session_epoch"), "user");

async function signedInEngineer() {
  const v = await createVendorWithStaff();
  const u = v.engineer.user;
  session.user = { id: u.id, email: u.email, name: u.name, isOperator: false };
  return v;
}

describe("the account page", () => {
  beforeEach(() => {
    session.user = null;
  });

  it("changes the password after checking the current one, and ends every session", async () => {
    const v = await signedInEngineer();
    const before = await userRow(v.engineer.user.id);
    const state = await changePasswordAction(
      initialActionState,
      formOf({ currentPassword: FACTORY_PASSWORD, newPassword: "a-new-long-password", repeatPassword: "a-new-long-password" }),
    );
    expect(state).toMatchObject({ ok: true });
    const after = await userRow(v.engineer.user.id);
    expect(await verifyPassword(after.password_hash, "a-new-long-password")).toBe(true);
    expect(after.session_epoch).toBe(before.session_epoch + 1);
  });

  it("names the wrong field and changes nothing: a wrong current password, two new ones that differ, a short one", async () => {
    const v = await signedInEngineer();
    const before = await userRow(v.engineer.user.id);
    const wrong = await changePasswordAction(
      initialActionState,
      formOf({ currentPassword: "not-it-at-all", newPassword: "a-new-long-password", repeatPassword: "a-new-long-password" }),
    );
    expect(wrong).toMatchObject({ ok: false, errors: { currentPassword: ["The current password is not right."] } });
    const differ = await changePasswordAction(
      initialActionState,
      formOf({ currentPassword: FACTORY_PASSWORD, newPassword: "a-new-long-password", repeatPassword: "another-long-one" }),
    );
    expect(differ).toMatchObject({ ok: false, errors: { repeatPassword: ["The two new passwords differ."] } });
    const short = await changePasswordAction(
      initialActionState,
      formOf({ currentPassword: FACTORY_PASSWORD, newPassword: "short", repeatPassword: "short" }),
    );
    expect(short).toMatchObject({ ok: false, errors: { newPassword: ["At least 10 characters."] } });
    expect(await userRow(v.engineer.user.id)).toEqual(before);
  });

  it("asks someone whose session has ended to sign in again", async () => {
    const state = await changePasswordAction(
      initialActionState,
      formOf({ currentPassword: "x", newPassword: "a-new-long-password", repeatPassword: "a-new-long-password" }),
    );
    expect(state).toMatchObject({ ok: false, message: expect.stringContaining("Sign in again") });
  });

  it("lets an account without a password set one without a current password", async () => {
    const v = await signedInEngineer();
    await db("users").where({ id: v.engineer.user.id }).update({ password_hash: null });
    expect((await getAccount(v.engineer.user.id)).hasPassword).toBe(false);
    const state = await changePasswordAction(
      initialActionState,
      formOf({ currentPassword: "", newPassword: "a-new-long-password", repeatPassword: "a-new-long-password" }),
    );
    expect(state).toMatchObject({ ok: true });
    expect((await getAccount(v.engineer.user.id)).hasPassword).toBe(true);
  });

  it("lists the person's own vendors with their role, and nobody else's", async () => {
    const v = await signedInEngineer();
    await createVendorWithStaff();
    expect((await getAccount(v.engineer.user.id)).memberships).toEqual([
      { vendorSlug: v.vendor.slug, vendorName: v.vendor.name, roleLabel: "Applications engineer" },
    ]);
  });

  it("signs out everywhere: the session epoch moves on and the page asks to sign in", async () => {
    const v = await signedInEngineer();
    const before = await userRow(v.engineer.user.id);
    let digest = "";
    try {
      await endAllSessionsAction();
    } catch (error) {
      digest = error && typeof error === "object" && "digest" in error ? String(error.digest) : String(error);
    }
    expect(digest).toMatch(/^NEXT_REDIRECT;.*\/sign-in\?callbackUrl=\/account/);
    expect((await userRow(v.engineer.user.id)).session_epoch).toBe(before.session_epoch + 1);
  });
});
