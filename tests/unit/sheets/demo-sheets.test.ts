import { describe, expect, it } from "vitest";

import { chipLoad, cuttingSpeed } from "@/lib/machining";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { newSheetSource } from "@/lib/sheets/new-sheet-source";
import { DEMO_CUTTERS, DEMO_MACHINE_CLASSES, DEMO_MATERIALS } from "@/seeds/sheets/demo-catalogue";
import { DEMO_SHEET_PLAN, REVISION_NOTE, seededVersions } from "@/seeds/sheets/demo-sheet-plan";
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

  it("every published sheet ends with the version re-derived by the revised rules, with its change note; the withdrawn one keeps its history", () => {
    for (const { sheet } of all) {
      const versions = seededVersions(sheet);
      const published = sheet.openDraft ? versions.slice(0, -1) : versions;
      if (sheet.withdrawnReason) expect(published.every((v) => v.derivation === "first-edition")).toBe(true);
      else expect(published.at(-1)).toMatchObject({ derivation: "current", changeNote: REVISION_NOTE });
      expect(published.slice(0, sheet.versions.length).every((v) => v.derivation === "first-edition")).toBe(true);
    }
  });

  it("every version's source validates, and its numbers follow vc = π·D·n/1000 inside the material window", () => {
    for (const { cutter, material, machineClass, sheet } of all) {
      expect(cutter && material && machineClass, `${sheet.cutter} × ${sheet.material}`).toBeTruthy();
      for (const version of seededVersions(sheet)) {
        const result = validateSheetSource(demoSheetSource({ cutter, material, machineClass, sheet, version }));
        expect(result.issues, `${sheet.cutter} × ${sheet.material}`).toEqual([]);
        const op = result.frontMatter!.operations[0];
        const D = Number(cutter.diameterMm);
        const vc = cuttingSpeed({ diameterMm: D, rpm: op.n.value });
        // n is clamped to the machine's range, so vc may fall below the window on a slow spindle, never above it.
        expect(vc).toBeLessThanOrEqual(Number(material.vcMaxMpm) * 1.01);
        expect(chipLoad({ feedMmMin: op.vf.value, rpm: op.n.value, flutes: Number(cutter.flutes) })).toBeGreaterThanOrEqual(
          Number(material.minChipLoadMm),
        );
      }
    }
  });

  it("a new sheet's template validates", () => {
    const { cutter, material, machineClass } = all[0];
    const source = newSheetSource({
      cutter: {
        sku: cutter.sku,
        name: cutter.name,
        diameterMm: Number(cutter.diameterMm),
        flutes: Number(cutter.flutes),
        cornerForm: "square",
      },
      material: {
        slug: material.slug,
        name: material.name,
        materialGroup: material.materialGroup,
        vcMinMpm: 150,
        vcMaxMpm: 300,
        minChipLoadMm: 0.05,
      },
      machineClass: { slug: machineClass.slug, name: machineClass.name, rpmMin: 8000, rpmMax: 24000, maxFeedMmMin: 5000, rigidity: 0.4 },
    });
    expect(validateSheetSource(source).ok).toBe(true);
  });

  it("the template gives a 1/32 in two-flute cutter in acrylic a chip under the band's ceiling, not one that snaps it", () => {
    const source = newSheetSource({
      cutter: { sku: "T-132", name: "1/32 in two-flute", diameterMm: 0.79375, flutes: 2, cornerForm: "square", fluteLengthMm: 2.4 },
      material: {
        slug: "cast-acrylic",
        name: "Cast acrylic",
        materialGroup: "plastics",
        vcMinMpm: 150,
        vcMaxMpm: 300,
        minChipLoadMm: 0.05,
        chipLoadMinPctD: 1.2,
        chipLoadMaxPctD: 3,
        kcNmm2: 120,
      },
      machineClass: {
        slug: "light-router",
        name: "Light router",
        rpmMin: 8000,
        rpmMax: 24000,
        maxFeedMmMin: 5000,
        rigidity: 0.4,
        zThrustN: 150,
      },
    });
    const result = validateSheetSource(source);
    expect(result.ok).toBe(true);
    for (const op of result.frontMatter!.operations) {
      const fz = chipLoad({ feedMmMin: op.vf.value, rpm: op.n.value, flutes: 2 });
      // Ceiling 3 % of D = 0.0238 mm per tooth; the first template gave 0.055 mm.
      expect(fz).toBeLessThanOrEqual(0.03 * 0.79375 * (op.kind === "slotting" ? 1 : 2.5));
      expect(fz).toBeLessThan(0.055 / 2);
    }
  });
});
