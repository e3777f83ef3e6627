import { afterAll, describe, expect, it } from "vitest";
import { z } from "zod";

import { cellProvenanceSchema, familyRulesSchema } from "@/content-schema/family";
import { readStoredOperations } from "@/lib/adapt/read-front-matter";
import { db } from "@/lib/db/knex";
import { generateBatch } from "@/lib/families/generate-batch";
import { getFamily } from "@/lib/families/get-family";
import { previewFamily } from "@/lib/families/preview-family";
import { saveFamilyRules } from "@/lib/families/save-family";
import { startGeneration } from "@/lib/families/start-generation";
import { getBoss } from "@/lib/jobs/boss";
import { createFamilyScenario, FAMILY_RULES } from "@/tests/factories/families";
import { mustExist } from "@/tests/support/must-exist";

import { engineOperation, engineWarnings } from "./engine-cells";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

// A rule that takes the profile 3·D deep on the light router: the engine warns that the cutter bends too far.
const DEEP_ON_LIGHT = {
  ...FAMILY_RULES,
  rules: [{ materialGroup: "plastics" as const, kind: "profile" as const, machineClass: "light-router", apPerD: 3 }],
};

async function generate(s: Awaited<ReturnType<typeof createFamilyScenario>>) {
  const batch = await startGeneration(s.as(s.engineer.user.id));
  await generateBatch({ vendorId: s.vendorId, batchId: batch.id, chunkSize: 3 });
  return batch;
}

const items = async (batchId: string) =>
  (await db("family_batch_items").where({ batch_id: batchId }).select("*")).map((r) => ({
    ...r,
    provenance: z.array(cellProvenanceSchema).parse(r.provenance),
  }));

describe("sheet families: preview and generation", () => {
  it("preview and generation match the engine's own results cell by cell; a warned cell is never generated", async () => {
    const s = await createFamilyScenario({ rules: DEEP_ON_LIGHT });
    const rules = familyRulesSchema.parse(DEEP_ON_LIGHT);
    const preview = await previewFamily({ vendorId: s.vendorId, slug: s.slug, rules });
    expect(preview.cells).toHaveLength(4);
    for (const cell of preview.cells) {
      const apPerD = cell.machineClass.slug === "light-router" ? 3 : undefined;
      const expected = [
        engineOperation(cell.cutter, s.material, cell.machineClass, "slotting"),
        engineOperation(cell.cutter, s.material, cell.machineClass, "profile", { apPerD }),
      ];
      expect(
        cell.operations.map((op) => [
          op.operation.n.text,
          op.operation.vf.text,
          op.operation.ap.text,
          op.operation.ae.text,
          op.operation.plungeFeed?.text,
        ]),
      ).toEqual(expected.map((op) => [op.n, op.vf, op.ap, op.ae, op.plungeFeed]));
      expect(cell.warnings.map((w) => w.code)).toEqual(
        expected.flatMap((op) => engineWarnings(cell.cutter, s.material, cell.machineClass, op)),
      );
      expect(cell.status).toBe(cell.warnings.length ? "warned" : "new");
    }
    const warned = preview.cells.filter((c) => c.status === "warned");
    expect(warned.length).toBeGreaterThan(0);

    const batch = await generate(s);
    const rows = await items(batch.id);
    expect(rows).toHaveLength(4);
    for (const cell of preview.cells) {
      const item = rows.find((r) => r.cutter_id === cell.cutter.id && r.machine_class_id === cell.machineClass.id)!;
      if (cell.status === "warned") {
        expect(item.outcome).toBe("blocked");
        expect(item.version_id).toBeNull();
        expect(
          await db("sheets").where({ vendor_id: s.vendorId, cutter_id: cell.cutter.id, machine_class_id: cell.machineClass.id }).first(),
        ).toBeUndefined();
        continue;
      }
      expect(item.outcome).toBe("created");
      const version = mustExist(
        await db("sheet_versions")
          .where({ id: mustExist(item.version_id, "version id") })
          .first(),
        "version",
      );
      expect(version.state).toBe("in_review");
      expect(readStoredOperations(version.front_matter)).toEqual(cell.operations.map((op) => op.operation));
      // Every generated number names its rules and rules version, in the record and in the sheet's own prose.
      expect(version.source).toContain("## How these numbers were found");
      expect(version.source).toContain("rules version 1");
      expect(item.provenance.map((p) => p.label)).toEqual(["Slot, full width", "Profile (contour)"]);
    }
    const family = await getFamily({ vendorId: s.vendorId, slug: s.slug });
    expect(mustExist(await db("family_batches").where({ family_id: family.id }).first(), "batch").state).toBe("in_review");
  });

  it("after the rule is fixed the warned cells generate, and their sheets say which rule version made the numbers", async () => {
    const s = await createFamilyScenario({ rules: DEEP_ON_LIGHT });
    await generate(s);
    const fixed = {
      ...FAMILY_RULES,
      rules: [{ materialGroup: "plastics" as const, kind: "profile" as const, machineClass: "light-router", apPerD: 0.5 }],
    };
    expect(
      await saveFamilyRules({
        ...s.as(s.engineer.user.id),
        rules: familyRulesSchema.parse(fixed),
        note: "Shallower profiles on light routers.",
      }),
    ).toEqual({ number: 2, created: true });
    const preview = await previewFamily({ vendorId: s.vendorId, slug: s.slug, rules: familyRulesSchema.parse(fixed) });
    expect(preview.cells.map((c) => c.status).sort()).toEqual(["new", "new", "unchanged", "unchanged"]);
    const batch = await generate(s);
    const rows = await items(batch.id);
    expect(rows.map((r) => r.outcome).sort()).toEqual(["created", "created", "unchanged", "unchanged"]);
    const created = rows.filter((r) => r.outcome === "created");
    for (const r of created) {
      expect(r.provenance[1].rules).toEqual(["plastics/profile@light-router"]);
      const version = mustExist(
        await db("sheet_versions")
          .where({ id: mustExist(r.version_id, "version id") })
          .first(),
        "version",
      );
      expect(version.source).toContain("Profile (contour): rule plastics/profile@light-router, rules version 2");
      expect(version.change_note).toContain("rules version 2");
    }
  });

  it("regenerating with unchanged rules creates no new versions", async () => {
    const s = await createFamilyScenario();
    await generate(s);
    const before = await db("sheet_versions").where({ vendor_id: s.vendorId }).count<{ count: string }[]>("id as count");
    expect(await saveFamilyRules({ ...s.as(s.engineer.user.id), rules: familyRulesSchema.parse(FAMILY_RULES), note: "same" })).toEqual({
      number: 1,
      created: false,
    });
    const again = await generate(s);
    expect((await items(again.id)).map((r) => r.outcome)).toEqual(["unchanged", "unchanged", "unchanged", "unchanged"]);
    const after = await db("sheet_versions").where({ vendor_id: s.vendorId }).count<{ count: string }[]>("id as count");
    expect(after[0].count).toBe(before[0].count);
  });

  it("a retried generation carries on where it stopped and writes no cell twice", async () => {
    const s = await createFamilyScenario({ cutters: 3 });
    const batch = await startGeneration(s.as(s.engineer.user.id));
    await generateBatch({ vendorId: s.vendorId, batchId: batch.id, chunkSize: 2 });
    // Pretend the job died after the first chunks: the batch is generating again with its items kept.
    await db("family_batches").where({ id: batch.id }).update({ state: "generating" });
    await generateBatch({ vendorId: s.vendorId, batchId: batch.id, chunkSize: 2 });
    expect(await items(batch.id)).toHaveLength(6);
    expect(await db("sheet_versions").where({ vendor_id: s.vendorId }).count<{ count: string }[]>("id as count")).toEqual([{ count: "6" }]);
  });

  it("another vendor's family is not found", async () => {
    const s = await createFamilyScenario();
    const other = await createFamilyScenario();
    await expect(previewFamily({ vendorId: other.vendorId, slug: s.slug, rules: familyRulesSchema.parse(FAMILY_RULES) })).rejects.toThrow(
      "No such family",
    );
  });
});
