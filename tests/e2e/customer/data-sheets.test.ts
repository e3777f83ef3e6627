import { execFileSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { unit } from "mathjs";
import { afterAll, describe, expect, it } from "vitest";

import { formatFeed, formatLength } from "@/lib/machining";
import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { SCREENSHOT_DIR } from "../support/env";
import { signInWithPassword } from "../support/sign-in";

const squash = (text: string) => text.replace(/[\u00a0\u202f]/g, " ").replace(/\s+/g, " ");

/** pdftotext's reading of the PDF, and its pages as PNGs in the (ignored) screenshots folder to look at. */
function readPdf(bytes: Buffer, name: string): string {
  const dir = path.join(SCREENSHOT_DIR, "pdf");
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${name}.pdf`);
  writeFileSync(file, bytes);
  execFileSync("pdftoppm", ["-png", "-r", "70", file, path.join(dir, name)]);
  return squash(execFileSync("pdftotext", ["-layout", file, "-"]).toString());
}

describe("printable data sheets", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("a visitor prints a sheet's data sheet and its cutter's data sheet from a public Library", { timeout: 240_000 }, async () => {
    const db = e2eDb();
    const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
    const row = await db("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .join("cutters as c", "c.id", "s.cutter_id")
      .where({ "v.vendor_id": vendor.id, "v.state": "published" })
      .orderBy("s.slug")
      .first("s.slug", "v.number", "v.front_matter", "c.sku", "c.diameter_mm");
    const s = await openBrowser();
    sessions.push(s);
    s.page.setDefaultNavigationTimeout(90_000);
    await s.page.goto(`/northbeck/library/${row.slug}`);
    const href = await s.page.getByRole("link", { name: "Data sheet (PDF)" }).getAttribute("href");
    expect(href).toBe(`/northbeck/library/${row.slug}/v/${row.number}/pdf`);
    await screenshot(s.page, "data-sheet-link");
    const res = await s.context.request.get(href!);
    expect(res.status()).toBe(200);
    expect(res.headers()["content-type"]).toBe("application/pdf");
    const text = readPdf(await res.body(), "sheet-data-sheet");
    const vf = Number(row.front_matter.operations[0].vf.value);
    // Both unit systems; the imperial feed is the metric one ÷ 25.4 (NIST SP 811), cross-checked with mathjs.
    expect(text).toContain(squash(formatFeed(vf, "metric")));
    expect(text).toContain(squash(formatFeed(vf, "imperial")));
    expect(Number(squash(formatFeed(vf, "imperial")).split(" ")[0])).toBeCloseTo(unit(vf, "mm/min").toNumber("in/min"), 1);
    expect(text).toContain(`${squash(formatLength(row.diameter_mm, "metric"))} (${squash(formatLength(row.diameter_mm, "imperial"))})`);
    expect(text).toContain(`version ${row.number}`);
    expect(text).toContain("Follow the machine maker's limits, local codes and workplace rules");
    expect(text).toContain(`/northbeck/library/${row.slug}/v/${row.number}`);

    await s.page.goto(`/northbeck/library/cutters/${encodeURIComponent(row.sku)}`);
    const cutterHref = await s.page.getByRole("link", { name: "Cutter data sheet (PDF)" }).getAttribute("href");
    const cutterRes = await s.context.request.get(cutterHref!);
    expect(cutterRes.status()).toBe(200);
    const cutterText = readPdf(await cutterRes.body(), "cutter-data-sheet");
    expect(cutterText).toContain(`Cutter data sheet · ${row.sku}`);
    expect(cutterText).toMatch(/\d+ current published sheets?/);
    expect(cutterText).toContain("Never leave a cut unattended.");
  });

  it("a customers-only Library prints only for its customers", { timeout: 240_000 }, async () => {
    const db = e2eDb();
    const vendor = mustExist(await db("vendors").where({ slug: "quillon" }).first("id"), "vendor");
    const row = await db("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .where({ "v.vendor_id": vendor.id, "v.state": "published" })
      .first("s.slug", "v.number");
    const url = `/quillon/library/${row.slug}/v/${row.number}/pdf`;
    const visitor = await openBrowser();
    sessions.push(visitor);
    expect((await visitor.context.request.get(url)).status()).toBe(401);
    const customer = await openBrowser();
    sessions.push(customer);
    await signInWithPassword(customer.page, "signs@example.test", "/quillon/library");
    const res = await customer.context.request.get(url);
    expect(res.status()).toBe(200);
    expect(readPdf(await res.body(), "customers-only-data-sheet")).toContain(`version ${row.number}`);
  });
});
