import { describe, expect, it } from "vitest";

import { isDatabaseUnavailable } from "@/lib/db/unavailable";

const withCode = (message: string, code: string) => Object.assign(new Error(message), { code });

describe("database unavailable", () => {
  it("recognises refused connections, shutdowns, pool timeouts and wrapped causes", () => {
    expect(isDatabaseUnavailable(withCode("connect ECONNREFUSED 127.0.0.1:5432", "ECONNREFUSED"))).toBe(true);
    expect(isDatabaseUnavailable(withCode("terminating connection due to administrator command", "57P01"))).toBe(true);
    expect(isDatabaseUnavailable(new Error("Knex: Timeout acquiring a connection. The pool is probably full."))).toBe(true);
    expect(isDatabaseUnavailable(new Error("Connection terminated unexpectedly"))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new AggregateError([withCode("x", "ECONNREFUSED")]), {}))).toBe(true);
    expect(isDatabaseUnavailable(new Error("select failed", { cause: withCode("the database system is starting up", "57P03") }))).toBe(
      true,
    );
  });

  it("leaves errors of the request itself alone", () => {
    expect(isDatabaseUnavailable(withCode("duplicate key value violates unique constraint", "23505"))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("Cannot read properties of undefined"))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
  });
});
