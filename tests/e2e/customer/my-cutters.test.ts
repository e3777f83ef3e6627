import { afterAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

// hobby@example.test owns a 24 000 rpm, 1.5 kW garage router (demo data) that both of Northbeck's machine classes fit.
const CUSTOMER = "hobby@example.test";

describe("my cutters", () => {
  let session: Session | undefined;
  afterAll(async () => {
    await session?.close();
    const db = e2eDb();
    const user = mustExist(await db("users").where({ email: CUSTOMER }).first("id"), "user");
    if (user) await db("customer_cutters").where({ user_id: user.id }).delete();
    await closeE2eDb();
  });

  it(
    "scan a cutter's QR code → add it; type another's SKU → the Bench lists their sheets per machine; the Library fits my shop",
    { timeout: 300_000 },
    async () => {
      const db = e2eDb();
      const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
      const user = mustExist(await db("users").where({ email: CUSTOMER }).first("id"), "user");
      await db("customer_cutters").where({ vendor_id: vendor.id, user_id: user.id }).delete();
      const withSheets = await db("cutters as c")
        .where("c.vendor_id", vendor.id)
        .whereExists((q) =>
          q
            .select(db.raw("1"))
            .from("sheets as s")
            .join("sheet_versions as v", "v.sheet_id", "s.id")
            .whereRaw("s.cutter_id = c.id")
            .where("v.state", "published"),
        )
        .orderBy("c.sku")
        .select("c.id", "c.sku", "c.short_code");
      expect(withSheets.length, "demo data: two Northbeck cutters with published sheets").toBeGreaterThanOrEqual(2);
      const [scanned, typed] = withSheets;

      session = await openBrowser();
      const { page } = session;
      page.setDefaultNavigationTimeout(90_000);
      await signInWithPassword(page, CUSTOMER, "/northbeck/library");
      // The box's QR code holds the short link; it leads to the cutter's page, where the cutter is added.
      await page.goto(`/c/${scanned.short_code}`);
      await page.waitForURL(new RegExp(`/northbeck/library/cutters/${scanned.sku}$`));
      await page.waitForLoadState("networkidle").catch(() => undefined);
      await page.getByRole("button", { name: "Add to my cutters" }).click();
      await page.getByText("✓ In my cutters").waitFor({ timeout: 30_000 });
      await screenshot(page, "my-cutters-added-from-cutter-page");

      await page.goto("/northbeck/bench");
      await page.waitForLoadState("networkidle").catch(() => undefined);
      await page.getByLabel("Cutter SKU").fill(typed.sku.toLowerCase());
      await page.getByRole("button", { name: "Add to my cutters" }).click();
      await page
        .getByRole("status")
        .filter({ hasText: `${typed.sku} is in your cutters now.` })
        .waitFor({ timeout: 30_000 });
      await page.reload();
      for (const cutter of [scanned, typed]) {
        const card = page.locator(`[data-my-cutter="${cutter.sku}"]`);
        await card.getByRole("heading", { name: /^On Garage router/ }).waitFor();
        expect(await card.getByRole("link", { name: "Adapt" }).count()).toBeGreaterThan(0);
      }
      await screenshot(page, "my-cutters-bench");

      await page.goto("/northbeck/library?shop=mine");
      expect(await page.getByLabel("Fits my shop").isChecked()).toBe(true);
      // Each sheet card names its cutter's SKU first.
      const skus = await page
        .locator("main ul > li")
        .evaluateAll((cards) => cards.map((li) => li.querySelector("p .num")?.textContent ?? ""));
      expect(skus.length).toBeGreaterThan(0);
      expect(new Set(skus)).toEqual(new Set([scanned.sku, typed.sku]));
      await screenshot(page, "my-cutters-library-fits-my-shop");

      await page.goto("/northbeck/bench");
      await page.waitForLoadState("networkidle").catch(() => undefined);
      await page
        .getByRole("form", { name: `Remove ${typed.sku} from my cutters` })
        .getByRole("button", { name: "Remove" })
        .click();
      await page.locator(`[data-my-cutter="${typed.sku}"]`).waitFor({ state: "detached", timeout: 30_000 });
      expect(await db("customer_cutters").where({ vendor_id: vendor.id, user_id: user.id }).pluck("cutter_id")).toEqual([scanned.id]);
    },
  );
});
