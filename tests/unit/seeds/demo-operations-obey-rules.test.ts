import { describe, expect, it } from "vitest";

import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { adaptOperation } from "@/lib/adapt/adapt-context";
import {
  ballNoseEffectiveDiameter,
  chipLoadBand,
  chipThinningFactor,
  cuttingSpeed,
  defaultZThrustN,
  plungeFeedPerRevForThrust,
  plungeThrustN,
  rigidityClassFromFactor,
  SLOTTING_FACTOR,
} from "@/lib/machining";
import { deriveOperation } from "@/lib/sheets/derive-starting-data";
import { deriveParts } from "@/seeds/sheets/demo-sheet-source";

import { demoVersions, referenceAsMachine } from "./demo-context";

// Invented demo data, checked against the engine's own rules: every operation of every current demo version
// (the published revision and open drafts; versions published before the rules were revised are kept as they
// were, as history) obeys the rules, and adapting it to its own reference machine raises no engine warning.

const all = demoVersions();
const current = all.filter((v) => v.version.derivation === "current");
const ops = current.flatMap((v) => v.context.operations.map((op) => ({ v, op })));
const NOTICES = new Set(["standard-cautions", "values-adapted"]);
const name = (v: (typeof all)[number], label: string) => `${v.vendor}/${v.slug} v${v.number} ${label}`;

describe("demo operations obey the engine's rules (invented demo data)", () => {
  it("walks every current demo operation: every sheet but the withdrawn one has one", () => {
    expect(ops.length).toBeGreaterThan(80);
    const sheetsWithCurrent = new Set(current.map((v) => `${v.vendor}/${v.slug}`));
    const notWithdrawn = new Set(all.filter((v) => !v.sheet.withdrawnReason).map((v) => `${v.vendor}/${v.slug}`));
    expect(sheetsWithCurrent).toEqual(notWithdrawn);
  });

  it("adapting each to its own reference machine raises no engine warning", () => {
    for (const { v, op } of ops) {
      const result = adaptOperation(v.context, op.index, referenceAsMachine(v), {}, { entryCapability: "helix" });
      expect(
        result.warnings.filter((w) => !NOTICES.has(w.code)).map((w) => `${w.code}: ${w.message}`),
        name(v, op.label),
      ).toEqual([]);
    }
  });

  it("the chip the edge sees (hex) sits inside the material's band; light passes are fed up by chip thinning (Altintas ch. 2)", () => {
    for (const { v, op } of ops) {
      const m = materialFieldsSchema.parse(v.material);
      const { diameterMm: d, flutes: z } = v.context.cutter;
      const band = chipLoadBand(
        { minChipLoadMm: m.minChipLoadMm, chipLoadPctOfD: { min: m.chipLoadMinPctD / 100, max: m.chipLoadMaxPctD / 100 } },
        d,
      );
      const de = v.context.cutter.cornerForm === "ball" ? ballNoseEffectiveDiameter({ diameterMm: d, axialDepthMm: op.axialDepthMm }) : d;
      const fz = op.feedMmMin / (z * op.rpm);
      const ctf = chipThinningFactor({ diameterMm: d, radialDepthMm: op.radialDepthMm });
      const hex = (fz / ctf) * (de / d);
      expect(hex, `${name(v, op.label)}: hex ${hex.toFixed(4)} mm`).toBeGreaterThanOrEqual(band.minMm);
      expect(hex, `${name(v, op.label)}: hex ${hex.toFixed(4)} mm`).toBeLessThanOrEqual(band.maxMm);
      if (op.radialDepthMm < d / 2) expect(fz, `${name(v, op.label)} fed up by thinning`).toBeGreaterThan(hex);
    }
  });

  it("vc (at De for a ball nose) is inside the material's window; feeds and plunges stay within 80 % of the machine's max feed", () => {
    for (const { v, op } of ops) {
      const k = machineClassFieldsSchema.parse(v.machineClass);
      const { diameterMm: d } = v.context.cutter;
      const de = v.context.cutter.cornerForm === "ball" ? ballNoseEffectiveDiameter({ diameterMm: d, axialDepthMm: op.axialDepthMm }) : d;
      const vc = cuttingSpeed({ diameterMm: de, rpm: op.rpm });
      expect(vc, name(v, op.label)).toBeGreaterThanOrEqual(v.context.material.vcMinMpm);
      expect(vc, name(v, op.label)).toBeLessThanOrEqual(v.context.material.vcMaxMpm);
      expect(op.feedMmMin, name(v, op.label)).toBeLessThanOrEqual(0.8 * k.maxFeedMmMin + 1e-9);
      if (op.plungeFeedMmMin !== null) expect(op.plungeFeedMmMin, name(v, op.label)).toBeLessThanOrEqual(0.8 * k.maxFeedMmMin + 1e-9);
    }
  });

  it("the plunge comes from the thrust model on the reference machine's Z, never from a third of the feed (calibrated thrust model)", () => {
    let plunges = 0;
    for (const { v, op } of ops) {
      if (op.plungeFeedMmMin === null) continue;
      plunges++;
      const k = machineClassFieldsSchema.parse(v.machineClass);
      const m = materialFieldsSchema.parse(v.material);
      const kc = m.kc11Nmm2 ?? m.kcNmm2;
      const zThrust = k.zThrustN ?? defaultZThrustN(rigidityClassFromFactor(k.rigidity));
      const fn = op.plungeFeedMmMin / op.rpm;
      expect(
        plungeThrustN({ diameterMm: v.context.cutter.diameterMm, kcNmm2: kc, feedPerRevMm: fn }),
        name(v, op.label),
      ).toBeLessThanOrEqual(zThrust);
      // Either the thrust sets it (within rounding to 10 mm/min) or the cutting feed caps it.
      const byThrust =
        plungeFeedPerRevForThrust({ diameterMm: v.context.cutter.diameterMm, kcNmm2: kc, zThrustN: 0.8 * zThrust })! * op.rpm;
      expect(Math.min(byThrust, op.feedMmMin) - op.plungeFeedMmMin, name(v, op.label)).toBeLessThan(10 + 1e-9);
      expect(Math.abs(op.plungeFeedMmMin - op.feedMmMin / 3), `${name(v, op.label)}: not vf/3`).toBeGreaterThan(10);
    }
    expect(plunges).toBeGreaterThan(40);
  });

  it("a full-width slot runs at the slotting factor of the pocketing chip (common practice: 70–80 % of the pocket feed)", () => {
    let slots = 0;
    for (const { v, op } of ops) {
      if (op.kind !== "slotting") continue;
      slots++;
      const { c, m, k } = deriveParts(v);
      const pocket = deriveOperation({
        cutter: c,
        material: m,
        machine: k,
        kind: "pocket",
        chipLoadScale: v.version.chipLoadScale,
        depthScale: v.version.depthScale,
      });
      const slotFz = op.feedMmMin / (c.flutes * op.rpm);
      const ratio = slotFz / pocket.derived.hexMm;
      expect(ratio, name(v, op.label)).toBeGreaterThanOrEqual(SLOTTING_FACTOR - 0.05);
      // The band wins over the factor: where 75 % of the pocketing chip would rub (a narrow band), the slot sits just over the floor.
      const floor = chipLoadBand(
        { minChipLoadMm: m.minChipLoadMm, chipLoadPctOfD: { min: m.chipLoadMinPctD / 100, max: m.chipLoadMaxPctD / 100 } },
        c.diameterMm,
      ).minMm;
      if (slotFz > 1.1 * floor + 1e-3) expect(ratio, name(v, op.label)).toBeLessThanOrEqual(SLOTTING_FACTOR + 0.05);
    }
    expect(slots).toBeGreaterThan(10);
  });
});
