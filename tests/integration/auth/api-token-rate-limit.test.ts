import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET as listMachinesRoute } from "@/app/api/v1/vendors/[vendor]/machines/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { db } from "@/lib/db/knex";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

const call = (slug: string, bearer: string, ip: string) =>
  listMachinesRoute(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/machines`, {
      headers: { authorization: `Bearer ${bearer}`, "x-swarfbook-peer": ip },
    }),
    {
      params: Promise.resolve({ vendor: slug }),
    },
  );
// The limiter takes small leases of a bucket's budget (lib/rate-limit), so a bucket holds at least the calls made.
const hits = async (key: string) => Number((await db("rate_limit_buckets").where({ key }).first("hits"))?.hits ?? 0);

describe("API rate-limit buckets of bearer tokens", () => {
  it("a made-up token does not choose its own bucket: it is counted against the client's address", async () => {
    const v = await createVendorWithStaff();
    const ip = `10.62.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;
    await db("rate_limit_buckets")
      .where({ key: `api:all:${ip}` })
      .delete();
    for (let i = 0; i < 5; i++) expect((await call(v.vendor.slug, `sbk_${uniq("made-up")}${i}`, ip)).status).toBe(404);
    expect(await hits(`api:all:${ip}`)).toBeGreaterThanOrEqual(5);
    expect(await db("rate_limit_buckets").where("key", "like", "api:all:sbk_%").first()).toBeUndefined();
  });

  it("a verified token is counted in the bucket of its own id, whatever address it comes from", async () => {
    const v = await createVendorWithStaff();
    const { secret } = await createPersonalToken({ vendorId: v.vendor.id, userId: v.customer.user.id, name: "script" });
    expect((await call(v.vendor.slug, secret, "10.63.0.1")).status).toBe(200);
    expect((await call(v.vendor.slug, secret, "10.63.0.2")).status).toBe(200);
    const token = mustExist(
      await db("api_tokens").where({ user_id: v.customer.user.id, vendor_id: v.vendor.id }).orderBy("created_at", "desc").first("id"),
      "token",
    );
    expect(await hits(`api:all:token:${token.id}`)).toBeGreaterThanOrEqual(2);
    expect(await db("rate_limit_buckets").whereIn("key", ["api:all:10.63.0.1", "api:all:10.63.0.2"]).first()).toBeUndefined();
  });
});
