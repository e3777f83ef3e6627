import { describe, expect, it } from "vitest";

import { authorizePassword, SIGN_IN_LIMITS } from "@/lib/auth/auth-options";
import { createUser, FACTORY_PASSWORD } from "@/tests/factories/foundation";

const headersFrom = (ip: string) => ({ "x-forwarded-for": ip });

describe("password sign-in", () => {
  it("accepts the right password and refuses a wrong one", async () => {
    const user = await createUser();
    await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom("10.9.0.1"))).resolves.toMatchObject({ id: user.id });
    await expect(authorizePassword({ email: user.email, password: "wrong-password" }, headersFrom("10.9.0.1"))).resolves.toBeNull();
    await expect(authorizePassword({ email: "nobody@example.test", password: "x" }, headersFrom("10.9.0.1"))).resolves.toBeNull();
  });

  it("rate-limits failed attempts per account, even from many addresses", async () => {
    const user = await createUser();
    for (let i = 0; i < SIGN_IN_LIMITS.perAccount.limit; i++) {
      await expect(authorizePassword({ email: user.email, password: "nope" }, headersFrom(`10.8.0.${i}`))).resolves.toBeNull();
    }
    // Locked now: even the right password is refused until the window passes.
    await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom("10.8.1.1"))).rejects.toThrow("rate_limited");
  });

  it("rate-limits attempts per address across accounts", async () => {
    const ip = "10.7.0.1";
    for (let i = 0; i < SIGN_IN_LIMITS.perIp.limit; i++) {
      await authorizePassword({ email: `probe-${i}@example.test`, password: "nope" }, headersFrom(ip));
    }
    await expect(authorizePassword({ email: "probe-last@example.test", password: "nope" }, headersFrom(ip))).rejects.toThrow("rate_limited");
  });

  it("does not count successful sign-ins against the address", async () => {
    const user = await createUser();
    const ip = "10.6.0.1";
    for (let i = 0; i < SIGN_IN_LIMITS.perIp.limit + 2; i++) {
      await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom(ip))).resolves.toMatchObject({ id: user.id });
    }
  });

  it("rejects malformed input without touching the database", async () => {
    await expect(authorizePassword({ email: "not-an-email", password: "" }, {})).resolves.toBeNull();
    await expect(authorizePassword(undefined, {})).resolves.toBeNull();
  });
});
