import { MachiningInputError } from "../errors";
import { positive } from "../validate";

/** Effective cutting diameter of a ball-nose at depth ap: De = 2·√(ap·(D − ap)), D once ap ≥ D/2. */
export function ballNoseEffectiveDiameter({ diameterMm, axialDepthMm }: { diameterMm: number; axialDepthMm: number }): number {
  const d = positive(diameterMm, "diameterMm");
  const ap = positive(axialDepthMm, "axialDepthMm");
  return ap >= d / 2 ? d : 2 * Math.sqrt(ap * (d - ap));
}

/** Scallop (cusp) height h = R − √(R² − (s/2)²) for a ball of diameter D = 2R at stepover s. */
export function scallopHeight({ diameterMm, stepoverMm }: { diameterMm: number; stepoverMm: number }): number {
  const r = positive(diameterMm, "diameterMm") / 2;
  const s = positive(stepoverMm, "stepoverMm");
  if (s > 2 * r) throw new MachiningInputError("stepoverMm", `stepoverMm (${s} mm) cannot exceed the ball diameter (${2 * r} mm).`);
  return r - Math.sqrt(r * r - (s / 2) ** 2);
}

/** Stepover that leaves scallop height h: s = 2·√(h·(2R − h)). */
export function stepoverForScallop({ diameterMm, scallopHeightMm }: { diameterMm: number; scallopHeightMm: number }): number {
  const r = positive(diameterMm, "diameterMm") / 2;
  const h = positive(scallopHeightMm, "scallopHeightMm");
  if (h > r) throw new MachiningInputError("scallopHeightMm", `scallopHeightMm (${h} mm) cannot exceed the ball radius (${r} mm).`);
  return 2 * Math.sqrt(h * (2 * r - h));
}
