import type { SheetOperation } from "@/content-schema/sheet-front-matter";
import type { AdaptInput } from "@/lib/machining";

export type CutterRow = { diameter_mm: number; flutes: number; corner_form: string; corner_radius_mm: number | null; tool_material: "carbide" | "hss" };
export type MaterialRow = { vc_min_mpm: number; vc_max_mpm: number; min_chip_load_mm: number; kc_nmm2: number };
export type MachineRow = { rpm_min: number; rpm_max: number; power_kw: number; max_feed_mm_min: number; rigidity: number; z_thrust_n: number | null; stickout_mm: number | null };

// One reader of stored front matter for the whole app (Bench owns it).
export { readStoredOperations as readOperations } from "@/lib/bench/read-front-matter";

/** The engine input for one operation of a sheet on a customer's machine (metric units throughout). */
export function toAdaptInput(op: SheetOperation, cutter: CutterRow, material: MaterialRow, referenceRigidity: number, machine: MachineRow): AdaptInput {
  const d = cutter.diameter_mm;
  return {
    operation: {
      kind: op.kind,
      diameterMm: d,
      flutes: cutter.flutes,
      rpm: op.n.value,
      feedMmMin: op.vf.value,
      axialDepthMm: op.ap.value,
      radialDepthMm: op.ae.unit === "%D" ? (op.ae.value / 100) * d : op.ae.value,
      plungeFeedMmMin: op.plungeFeed?.value,
      cornerRadiusMm: cutter.corner_form === "ball" ? d / 2 : (cutter.corner_radius_mm ?? undefined),
    },
    material: {
      cuttingSpeedWindowMpm: [material.vc_min_mpm, material.vc_max_mpm],
      minChipLoadMm: material.min_chip_load_mm,
      specificCuttingForceNmm2: material.kc_nmm2,
    },
    referenceMachine: { rigidity: referenceRigidity },
    machine: {
      minRpm: machine.rpm_min,
      maxRpm: machine.rpm_max,
      maxFeedMmMin: machine.max_feed_mm_min,
      spindlePowerKw: machine.power_kw,
      rigidity: machine.rigidity,
      zThrustN: machine.z_thrust_n ?? undefined,
    },
    overrides: { stickoutMm: machine.stickout_mm ?? undefined },
    options: { toolMaterial: cutter.tool_material },
  };
}
