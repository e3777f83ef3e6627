import { describe, expect, it } from "vitest";

import { chipLoad, cuttingSpeed } from "@/lib/machining";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { newSheetSource } from "@/lib/sheets/new-sheet-source";
import { DEMO_CUTTERS, DEMO_MACHINE_CLASSES, DEMO_MATERIALS } from "@/seeds/sheets/demo-catalogue";
import { DEMO_SHEET_PLAN } from "@/seeds/sheets/demo-sheet-plan";
import { demoSheetSource } from "@/seeds/sheets/demo-sheet-source";

const all = Object.entries(DEMO_SHEET_PLAN).flatMap(([vendor, plan]) =>
  plan.map((sheet) => ({
    vendor,
    sheet,
    cutter: DEMO_CUTTERS[vendor].find((c) => c.sku === sheet.cutter)!,
    material: DEMO_MATERIALS[vendor].find((m) => m.slug === sheet.material)!,
    machineClass: DEMO_MACHINE_CLASSES[vendor].find((k) => k.slug === sheet.machineClass)!,
  })),
);

describe("demo sheets (invented demo data)", () => {
  it("plans at least 40 sheets across both vendors, several with 2–3 versions and one withdrawn", () => {
    expect(all.length).toBeGreaterThanOrEqual(40);
    expect(new Set(all.map((s) => s.vendor))).toEqual(new Set(["northbeck", "quillon"]));
    expect(all.filter((s) => s.sheet.versions.length >= 2).length).toBeGreaterThanOrEqual(5);
    expect(all.some((s) => s.sheet.versions.length === 3)).toBe(true);
    expect(all.filter((s) => s.sheet.withdrawnReason)).toHaveLength(1);
  });

  it("every version's source validates, and its numbers follow vc = π·D·n/1000 inside the material window", () => {
    for (const { cutter, material, machineClass, sheet } of all) {
      expect(cutter && material && machineClass, `${sheet.cutter} × ${sheet.material}`).toBeTruthy();
      for (const version of sheet.versions) {
        const result = validateSheetSource(demoSheetSource({ cutter, material, machineClass, sheet, version }));
        expect(result.issues, `${sheet.cutter} × ${sheet.material}`).toEqual([]);
        const op = result.frontMatter!.operations[0];
        const D = Number(cutter.diameterMm);
        const vc = cuttingSpeed({ diameterMm: D, rpm: op.n.value });
        // n is clamped to the machine's range, so vc may fall below the window on a slow spindle, never above it.
        expect(vc).toBeLessThanOrEqual(Number(material.vcMaxMpm) * 1.01);
        expect(chipLoad({ feedMmMin: op.vf.value, rpm: op.n.value, flutes: Number(cutter.flutes) })).toBeGreaterThanOrEqual(Number(material.minChipLoadMm));
      }
    }
  });

  it("a new sheet's template validates", () => {
    const { cutter, material, machineClass } = all[0];
    const source = newSheetSource({
      cutter: { sku: cutter.sku, name: cutter.name, diameterMm: Number(cutter.diameterMm), flutes: Number(cutter.flutes), cornerForm: "square" },
      material: { slug: material.slug, name: material.name, materialGroup: material.materialGroup, vcMinMpm: 150, vcMaxMpm: 300, minChipLoadMm: 0.05 },
      machineClass: { slug: machineClass.slug, name: machineClass.name, rpmMin: 8000, rpmMax: 24000, maxFeedMmMin: 5000, rigidity: 0.4 },
    });
    expect(validateSheetSource(source).ok).toBe(true);
  });
});
