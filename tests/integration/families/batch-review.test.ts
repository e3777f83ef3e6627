import { afterAll, describe, expect, it } from "vitest";

import { familyRulesSchema } from "@/content-schema/family";
import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createSetup } from "@/lib/bench/create-setup";
import { createMachine } from "@/lib/bench/machines";
import { sendChangeAlerts } from "@/lib/bench/send-change-alerts";
import { db } from "@/lib/db/knex";
import { approveBatch } from "@/lib/families/approve-batch";
import { excludeBatchItem } from "@/lib/families/exclude-batch-item";
import { generateBatch } from "@/lib/families/generate-batch";
import { publishBatch } from "@/lib/families/publish-batch";
import { saveFamilyRules } from "@/lib/families/save-family";
import { sendBatchAlerts } from "@/lib/families/send-batch-alerts";
import { startGeneration } from "@/lib/families/start-generation";
import { getBoss } from "@/lib/jobs/boss";
import { approveDraft } from "@/lib/sheets/approve-draft";
import { publishDraft } from "@/lib/sheets/publish-draft";
import { returnToDraft } from "@/lib/sheets/return-to-draft";
import { weakMachineFields } from "@/tests/factories/bench";
import { createFamilyScenario, FAMILY_RULES } from "@/tests/factories/families";
import { createMember } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

type Scenario = Awaited<ReturnType<typeof createFamilyScenario>>;

async function generate(s: Scenario) {
  const batch = await startGeneration(s.as(s.engineer.user.id));
  await generateBatch({ vendorId: s.vendorId, batchId: batch.id });
  return batch;
}

const review = (s: Scenario, number: number) => ({ ...s.as(s.engineer2.user.id), number });
const publishedCount = async (vendorId: string) =>
  Number(
    (await db("sheet_versions").where({ vendor_id: vendorId, state: "published" }).count<{ count: string }[]>("id as count"))[0].count,
  );
const mailsTo = async (email: string) =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [email])).rows.map(
    (r: { data: { subject: string; text: string } }) => r.data,
  );

/** The first batch published: every cell of the family has a published v1. */
async function publishedFamily(s: Scenario) {
  const batch = await generate(s);
  await approveBatch(review(s, batch.number));
  await publishBatch(review(s, batch.number));
  return batch;
}

async function customerWithSetupsOn(vendorId: string, versionIds: string[]) {
  const member = await createMember(vendorId, "customer");
  const machine = await createMachine({ vendorId, userId: member.user.id, fields: machineFieldsSchema.parse(weakMachineFields) });
  for (const versionId of versionIds)
    await createSetup({
      vendorId,
      userId: member.user.id,
      input: setupCreateSchema.parse({ versionId, machineId: machine.id, operationIndex: 0 }),
    });
  return member.user;
}

describe("sheet families: batch review and publish", () => {
  it("the engineer who generated a batch cannot approve it; a second engineer approves and publishes it", async () => {
    const s = await createFamilyScenario();
    const batch = await generate(s);
    await expect(approveBatch({ ...s.as(s.engineer.user.id), number: batch.number })).rejects.toThrow("an engineer other than you");
    await expect(publishBatch(review(s, batch.number))).rejects.toThrow("this step needs it approved");
    expect(await approveBatch(review(s, batch.number))).toEqual({ approved: 4 });
    expect(await publishBatch(review(s, batch.number))).toEqual({ published: 4, returned: 0 });
    expect(await publishedCount(s.vendorId)).toBe(4);
  });

  it("a sheet left out with a reason is not published and goes back to draft", async () => {
    const s = await createFamilyScenario();
    const batch = await generate(s);
    const item = mustExist(await db("family_batch_items").where({ batch_id: batch.id }).orderBy("id").first(), "batch item");
    await expect(excludeBatchItem({ ...review(s, batch.number), itemId: item.id, reason: "" })).rejects.toThrow();
    await excludeBatchItem({ ...review(s, batch.number), itemId: item.id, reason: "Test cut pending on this cutter." });
    await approveBatch(review(s, batch.number));
    expect(await publishBatch(review(s, batch.number))).toEqual({ published: 3, returned: 1 });
    expect(
      mustExist(
        await db("sheet_versions")
          .where({ id: mustExist(item.version_id, "version id") })
          .first(),
        "version",
      ).state,
    ).toBe("draft");
  });

  it("a sheet of a batch under review is not published alone, and the batch still publishes whole", async () => {
    const s = await createFamilyScenario();
    const batch = await generate(s);
    await approveBatch(review(s, batch.number));
    const kept = await db("family_batch_items as i")
      .join("sheets as sh", "sh.id", "i.sheet_id")
      .where({ "i.batch_id": batch.id })
      .orderBy("sh.slug")
      .first("sh.slug");
    await expect(publishDraft({ ...review(s, batch.number), slug: kept.slug })).rejects.toThrow(
      `belongs to batch ${batch.number} of the family`,
    );
    expect(await publishedCount(s.vendorId)).toBe(0);
    // The whole batch still publishes afterwards: nothing was half done.
    expect(await publishBatch(review(s, batch.number))).toEqual({ published: 4, returned: 0 });
  });

  it("a sheet the reviewer left out of a batch can be published on its own", async () => {
    const s = await createFamilyScenario();
    const batch = await generate(s);
    const item = await db("family_batch_items as i")
      .join("sheets as sh", "sh.id", "i.sheet_id")
      .where({ "i.batch_id": batch.id })
      .orderBy("sh.slug")
      .first("i.id", "sh.slug");
    await excludeBatchItem({ ...review(s, batch.number), itemId: item.id, reason: "Published on its own after a test cut." });
    await approveDraft({ ...review(s, batch.number), slug: item.slug });
    expect(await publishDraft({ ...review(s, batch.number), slug: item.slug })).toMatchObject({ state: "published" });
  });

  it("batch publish is all or nothing: one sheet that cannot be published keeps every sheet of the batch unpublished", async () => {
    const s = await createFamilyScenario();
    const batch = await generate(s);
    await approveBatch(review(s, batch.number));
    // Someone returns one sheet of the approved batch to draft on its own page.
    const item = mustExist(
      await db("family_batch_items as i")
        .join("sheets as sh", "sh.id", "i.sheet_id")
        .where({ "i.batch_id": batch.id })
        .orderBy("sh.slug", "desc")
        .first<{ slug: string } | undefined>("sh.slug"),
      "batch item",
    );
    await returnToDraft({ ...s.as(s.engineer.user.id), slug: item.slug });
    await expect(publishBatch(review(s, batch.number))).rejects.toThrow(item.slug);
    expect(await publishedCount(s.vendorId)).toBe(0);
    expect(mustExist(await db("family_batches").where({ id: batch.id }).first(), "batch").state).toBe("approved");
    expect(
      await db.raw("select count(*)::int as n from pgboss.job where name = 'families.alerts' and data->>'batchId' = ?", [batch.id]),
    ).toMatchObject({ rows: [{ n: 0 }] });
  });

  it("sends one alert mail per customer per batch, listing every changed sheet of theirs; a retry sends nothing twice", async () => {
    const s = await createFamilyScenario();
    await publishedFamily(s);
    const v1 = await db("sheet_versions as v")
      .join("sheets as sh", "sh.id", "v.sheet_id")
      .where({ "v.vendor_id": s.vendorId, "v.state": "published" })
      .orderBy("sh.slug")
      .select("v.id", "v.title", "sh.slug");
    const both = await customerWithSetupsOn(s.vendorId, [v1[0].id, v1[1].id, v1[2].id]);
    const one = await customerWithSetupsOn(s.vendorId, [v1[3].id]);
    // Rules version 2 runs the chip higher in the band: every sheet gets a new version.
    await saveFamilyRules({
      ...s.as(s.engineer.user.id),
      rules: familyRulesSchema.parse({ ...FAMILY_RULES, rules: [{ materialGroup: "plastics", kind: "slotting", chipLoadPosition: 0.6 }] }),
      note: "Higher chip in slots.",
    });
    const batch = await generate(s);
    expect((await db("family_batch_items").where({ batch_id: batch.id }).pluck("outcome")).sort()).toEqual([
      "new-version",
      "new-version",
      "new-version",
      "new-version",
    ]);
    await approveBatch(review(s, batch.number));
    await publishBatch(review(s, batch.number));

    // The per-sheet alert stays quiet for a batch's sheets: the batch sends its own.
    const event = await db.raw("select data from pgboss.job where name = 'sheet.events' and data->>'batchId' = ? limit 1", [batch.id]);
    expect(await sendChangeAlerts(event.rows[0].data)).toBe(0);

    expect(await sendBatchAlerts({ vendorId: s.vendorId, batchId: batch.id })).toBe(2);
    const [mail] = await mailsTo(both.email);
    expect(await mailsTo(both.email)).toHaveLength(1);
    expect(await mailsTo(one.email)).toHaveLength(1);
    expect(mail.subject).toContain("3 sheets you use have new versions");
    for (const v of v1.slice(0, 3)) expect(mail.text).toContain(`${v.title}: version 1 → version 2`);
    expect(mail.text).not.toContain(`/library/${v1[3].slug}/`);
    expect(mail.text).toMatch(/vf \(feed rate\): /);

    expect(await sendBatchAlerts({ vendorId: s.vendorId, batchId: batch.id })).toBe(0);
    expect(await mailsTo(both.email)).toHaveLength(1);
  });
});
