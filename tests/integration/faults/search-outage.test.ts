import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { createDraftingScenario, publishOpenDraft } from "@/tests/factories/sheets";

import { emptyQueue, report, waitFor } from "./support/services";

let stopBoss: (() => Promise<void>) | null = null;
afterAll(async () => {
  await db.raw("alter table if exists search_documents_away rename to search_documents").catch(() => undefined);
  await stopBoss?.();
});

const indexed = async (vendorId: string, versionId: string) =>
  Number((await db("search_documents").where({ vendor_id: vendorId, version_id: versionId }).count<{ n: number }[]>("* as n"))[0].n);

describe("fault: the search engine is unavailable during publishing", () => {
  it("publishes anyway, and the index catches up when the engine is back", async () => {
    await emptyQueue();
    const { startWorker } = await import("@/lib/jobs/start-worker");
    stopBoss = (await import("@/lib/jobs/boss")).stopBoss;
    const scenarios = await Promise.all(Array.from({ length: 3 }, () => createDraftingScenario()));
    await startWorker();

    // The PostgreSQL engine's document table is gone: every index write fails until it is back.
    await db.raw("alter table search_documents rename to search_documents_away");
    const published: { vendorId: string; versionId: string }[] = [];
    for (const s of scenarios) published.push({ vendorId: s.vendor.id, ...(await publishOpenDraft(s)) });
    await new Promise((resolve) => setTimeout(resolve, 4_000));
    const failedAttempts = Number(
      (
        await db.raw(
          "select coalesce(sum(retry_count), 0)::int as n from pgboss.job where name = 'sheet.events.deliver' and data->>'subscriber' = 'search-index'",
        )
      ).rows[0].n,
    );
    const versionsPublished = Number(
      (
        await db("sheet_versions")
          .whereIn(
            "id",
            published.map((p) => p.versionId),
          )
          .where({ state: "published" })
          .count<{ n: number }[]>("* as n")
      )[0].n,
    );

    await db.raw("alter table search_documents_away rename to search_documents");
    const back = Date.now();
    const caughtUp = await waitFor(
      async () => (await Promise.all(published.map((p) => indexed(p.vendorId, p.versionId)))).every((n) => n > 0),
      { timeoutMs: 60_000 },
    );
    const docs = await Promise.all(published.map((p) => indexed(p.vendorId, p.versionId)));

    report("search-outage", {
      published: published.length,
      versionsPublished,
      failedIndexAttempts: failedAttempts,
      caughtUpWithinMs: Date.now() - back,
      documentsPerVersion: docs,
    });
    expect(versionsPublished).toBe(published.length);
    expect(failedAttempts).toBeGreaterThan(0);
    expect(caughtUp).toBe(true);
  });
});
