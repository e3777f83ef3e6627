import type { AdaptContext } from "@/lib/adapt/adapt-context";

// Invented demo data: a 3.175 mm single-flute cutter in cast acrylic (vc 150–300 m/min, min fz 0.05 mm,
// kc 100 N/mm², a chip-load band of 1.2–3.5 % of D so the slot's 0.1 mm sits inside it) on a reference class of
// rigidity 0.8. Slot: n 18 000 rpm, vf 1800 mm/min → fz 0.1 mm.
export const acrylicContext: AdaptContext = {
  versionId: "00000000-0000-4000-8000-000000000001",
  versionNumber: 1,
  versionState: "published",
  sheetSlug: "cast-acrylic-demo",
  title: "Cast acrylic, 1/8 in single-flute cutter",
  cutter: { sku: "SF-125", name: "Single flute", diameterMm: 3.175, flutes: 1, cornerRadiusMm: null, cornerForm: "square", fluteLengthMm: 12, toolMaterial: "carbide" },
  material: { name: "Cast acrylic", vcMinMpm: 150, vcMaxMpm: 300, minChipLoadMm: 0.05, kcNmm2: 100, chipLoadMinPctD: 1.2, chipLoadMaxPctD: 3.5, kc11Nmm2: null, mc: null, meltsWhenRubbing: true },
  referenceMachine: { name: "Rigid router", rigidity: 0.8, rpmMin: 8000, rpmMax: 24000, maxFeedMmMin: 10000, zThrustN: null },
  operations: [
    { index: 0, label: "Full-width slot", kind: "slotting", rpm: 18000, feedMmMin: 1800, axialDepthMm: 1.5, radialDepthMm: 3.175, plungeFeedMmMin: 500, entry: "ramp", rampAngleDeg: 3 },
    { index: 1, label: "Outside profile", kind: "profile", rpm: 18000, feedMmMin: 1800, axialDepthMm: 3, radialDepthMm: 0.5, plungeFeedMmMin: null, entry: null, rampAngleDeg: null },
  ],
  cautions: [{ kind: "melting", text: "Keep the feed up." }],
};
