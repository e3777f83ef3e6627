import AxeBuilder from "@axe-core/playwright";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

// axe-core's WCAG 2.0/2.1 level A and AA rules on the main page of each area, as each audience sees it.
// Colour contrast, names of controls, landmarks and ARIA use are what these catch; keyboard journeys are
// covered by the feature tests.
const TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

async function violations(session: Session, url: string) {
  await session.page.goto(url);
  await session.page.waitForLoadState("networkidle");
  const result = await new AxeBuilder({ page: session.page }).withTags(TAGS).analyze();
  return result.violations.map((v) => `${url}: ${v.id} (${v.nodes.length}×) ${v.nodes[0]?.target.join(" ")}`);
}

describe("accessibility (axe, WCAG 2.1 A/AA)", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("pages for visitors, customers and staff have no violations", { timeout: 480_000 }, async () => {
    const sheet = await e2eDb()("sheets as s")
      .join("vendors as d", "d.id", "s.vendor_id")
      .where("d.slug", "northbeck")
      .orderBy("s.slug")
      .first("s.slug");
    const audiences: { who: string | null; urls: string[] }[] = [
      {
        who: null,
        urls: [
          "/",
          "/sign-in",
          "/northbeck/library",
          `/northbeck/library/${sheet.slug}`,
          "/northbeck/library/search?q=1%2F8+acrylic+slot",
          "/developers/api",
        ],
      },
      { who: "maker@example.test", urls: ["/northbeck/bench", "/northbeck/support", "/northbeck/support/new"] },
      {
        who: "eng1@northbeck.test",
        urls: ["/northbeck/drafting", "/northbeck/drafting/sheets", "/northbeck/drafting/field", `/northbeck/drafting/field/${sheet.slug}`],
      },
      {
        who: "admin@northbeck.test",
        urls: [
          "/northbeck/desk",
          "/northbeck/desk/dashboard",
          "/northbeck/admin",
          "/northbeck/admin/members",
          "/northbeck/admin/integrations",
        ],
      },
    ];
    const found: string[] = [];
    for (const { who, urls } of audiences) {
      const session = await openBrowser();
      sessions.push(session);
      session.page.setDefaultNavigationTimeout(90_000);
      if (who) await signInWithPassword(session.page, who, urls[0]);
      for (const url of urls) found.push(...(await violations(session, url)));
    }
    expect(found).toEqual([]);
  });
});
