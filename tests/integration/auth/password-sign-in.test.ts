import { describe, expect, it } from "vitest";

import { authorizePassword, SIGN_IN_LIMITS } from "@/lib/auth/auth-options";
import { createUser, FACTORY_PASSWORD } from "@/tests/factories/foundation";

// As the app's server stamps them: the TCP peer is the client (no trusted proxies in tests).
const headersFrom = (ip: string) => ({ "x-swarfbook-peer": ip, "x-swarfbook-forwarded-for": "" });

const outcome = (p: Promise<unknown>) =>
  p.then(
    (user) => (user ? "signed-in" : "refused"),
    (error: Error) => error.message,
  );

describe("password sign-in", () => {
  it("accepts the right password and refuses a wrong one", async () => {
    const user = await createUser();
    await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom("10.9.0.1"))).resolves.toMatchObject({
      id: user.id,
    });
    await expect(authorizePassword({ email: user.email, password: "wrong-password" }, headersFrom("10.9.0.1"))).resolves.toBeNull();
    await expect(authorizePassword({ email: "nobody@example.test", password: "x" }, headersFrom("10.9.0.1"))).resolves.toBeNull();
  });

  it("a parallel burst of wrong passwords is limited: attempts are counted before the password is checked", async () => {
    const user = await createUser();
    const burst = await Promise.all(
      Array.from({ length: 30 }, () =>
        outcome(authorizePassword({ email: user.email, password: "guess-password" }, headersFrom("10.8.0.1"))),
      ),
    );
    expect(burst.filter((o) => o === "refused")).toHaveLength(SIGN_IN_LIMITS.perAccountAndIp.limit);
    expect(burst.filter((o) => o === "rate_limited")).toHaveLength(30 - SIGN_IN_LIMITS.perAccountAndIp.limit);
    // That address is stopped even with the right password…
    await expect(outcome(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom("10.8.0.1")))).resolves.toBe(
      "rate_limited",
    );
    // …but the attacker has not locked the owner out: from the owner's own address the password works.
    await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom("10.8.9.9"))).resolves.toMatchObject({
      id: user.id,
    });
  });

  it("past the per-account ceiling, guesses from many addresses are only slowed, and the owner still gets in", async () => {
    const user = await createUser();
    const { limit } = SIGN_IN_LIMITS.perAccountCeiling;
    for (let i = 0; i < limit; i++) {
      await expect(authorizePassword({ email: user.email, password: "nope-nope" }, headersFrom(`10.5.${i}.1`))).resolves.toBeNull();
    }
    // Over the ceiling: one attempt per slow window for the account, whoever makes it.
    const burst = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        outcome(authorizePassword({ email: user.email, password: "nope-nope" }, headersFrom(`10.5.200.${i}`))),
      ),
    );
    expect(burst.filter((o) => o === "refused")).toHaveLength(SIGN_IN_LIMITS.slowed.limit);
    // The owner waits out the short slow window and signs in (simulated: the window's bucket is expired).
    const { db } = await import("@/lib/db/knex");
    await db("rate_limit_buckets")
      .where({ key: `sign-in:slow:${user.email}` })
      .update({ window_start: new Date(Date.now() - 60_000) });
    await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom("10.5.250.1"))).resolves.toMatchObject({
      id: user.id,
    });
  });

  it("guesses from many addresses do not slow the owner at an address they have signed in from before", async () => {
    const user = await createUser();
    const home = "10.3.77.1";
    await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom(home))).resolves.toMatchObject({
      id: user.id,
    });
    const { limit } = SIGN_IN_LIMITS.perAccountCeiling;
    for (let i = 0; i < limit + 3; i++)
      await outcome(authorizePassword({ email: user.email, password: "nope-nope" }, headersFrom(`10.3.${i}.9`)));
    // The attacker keeps the slow window busy; the owner's known address is not held by it…
    await outcome(authorizePassword({ email: user.email, password: "nope-nope" }, headersFrom("10.3.200.9")));
    for (let i = 0; i < 3; i++) {
      await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom(home))).resolves.toMatchObject({
        id: user.id,
      });
    }
    // …while a new address still is.
    const fresh = await Promise.all(
      Array.from({ length: 3 }, (_, i) =>
        outcome(authorizePassword({ email: user.email, password: "nope-nope" }, headersFrom(`10.3.201.${i}`))),
      ),
    );
    expect(fresh.filter((o) => o === "rate_limited").length).toBeGreaterThanOrEqual(2);
  });

  it("rate-limits attempts per address across accounts", async () => {
    const ip = "10.7.0.1";
    for (let i = 0; i < SIGN_IN_LIMITS.perIp.limit; i++) {
      await authorizePassword({ email: `probe-${i}@example.test`, password: "nope" }, headersFrom(ip));
    }
    await expect(authorizePassword({ email: "probe-last@example.test", password: "nope" }, headersFrom(ip))).rejects.toThrow(
      "rate_limited",
    );
  });

  it("a rotating X-Forwarded-For does not give a guesser new addresses", async () => {
    const user = await createUser();
    const results: string[] = [];
    for (let i = 0; i < SIGN_IN_LIMITS.perAccountAndIp.limit + 2; i++) {
      results.push(
        await outcome(
          authorizePassword(
            { email: user.email, password: "nope-nope" },
            { ...headersFrom("10.4.0.1"), "x-swarfbook-forwarded-for": `172.16.0.${i}`, "x-forwarded-for": `172.16.0.${i}` },
          ),
        ),
      );
    }
    expect(results.slice(-2)).toEqual(["rate_limited", "rate_limited"]);
  });

  it("does not count successful sign-ins against the address", async () => {
    const user = await createUser();
    const ip = "10.6.0.1";
    for (let i = 0; i < SIGN_IN_LIMITS.perIp.limit + 2; i++) {
      await expect(authorizePassword({ email: user.email, password: FACTORY_PASSWORD }, headersFrom(ip))).resolves.toMatchObject({
        id: user.id,
      });
    }
  });

  it("rejects malformed input without touching the database", async () => {
    await expect(authorizePassword({ email: "not-an-email", password: "" }, {})).resolves.toBeNull();
    await expect(authorizePassword(undefined, {})).resolves.toBeNull();
  });
});
