import { positive } from "../validate";

// A VFD holding V/f constant keeps torque constant below the spindle's rated (base) speed, so
// power falls in proportion to speed there (electric drives, common practice). A spindle declared
// constant-power gives its rated power at every speed.

export type SpindleKindName = "constant-torque" | "constant-power";

/** P(n) = P_rated · min(1, n / n_rated) for a constant-torque spindle; P_rated for constant-power. */
export function spindlePowerAt({
  ratedPowerKw,
  rpm,
  ratedRpm,
  spindleKind = "constant-torque",
}: {
  ratedPowerKw: number;
  rpm: number;
  ratedRpm: number;
  spindleKind?: SpindleKindName;
}): number {
  const p = positive(ratedPowerKw, "ratedPowerKw");
  if (spindleKind === "constant-power") return p;
  return p * Math.min(1, positive(rpm, "rpm") / positive(ratedRpm, "ratedRpm"));
}
