import { MIN_AXIAL_DEPTH_SHARE } from "../defaults";
import { say } from "../message-units";
import { change, effectiveDiameter, kcAt, meanFactor, warn, type AdaptState } from "../state";

/** Pc = ap·ae·vf·kc(hm) / (60·10⁶·η) at the state's numbers and the given ap; null without cutting-force data. */
export function powerAt(s: AdaptState, apMm: number): number | null {
  const hm = s.chipLoadMm * meanFactor(s, s.radialDepthMm, apMm);
  const kc = kcAt(s, hm);
  return kc === null ? null : (apMm * s.radialDepthMm * s.feedMmMin * kc) / (60e6 * s.input.spindleEfficiency);
}

/** P(n) = P_rated·min(1, n/n_rated) for a constant-torque (VFD) spindle; P_rated for a constant-power one. */
export function availablePower(s: AdaptState): number {
  const { ratedRpm, spindleKind } = s.input;
  const spindlePowerKw = s.input.machine.spindlePowerKw;
  return spindleKind === "constant-power" ? spindlePowerKw : spindlePowerKw * Math.min(1, s.rpm / ratedRpm);
}

/** Rule 9: Pc with kc(hm) against P(n) × the usable fraction; ap comes down to fit. */
export function spindlePower(s: AdaptState): void {
  s.meanChipThicknessMm = s.chipLoadMm * meanFactor(s, s.radialDepthMm, s.axialDepthMm);
  s.availablePowerKw = availablePower(s);
  const apBefore = s.axialDepthMm;
  const first = powerAt(s, apBefore);
  if (first === null) {
    warn(
      s,
      "no-cutting-force-data",
      "This material has no specific cutting force on file, so spindle power, cutting force, deflection and plunge thrust were not checked.",
    );
    return;
  }
  const units = s.input.units;
  const usable = s.availablePowerKw * s.input.usablePowerFraction;
  if (first > usable) {
    let ap = (s.axialDepthMm * usable) / first;
    // A shallow ball nose cuts with a thinner mean chip, where kc rises: settle ap in a few steps.
    for (let i = 0; i < 4 && s.input.ballNose; i++) {
      const p = powerAt(s, ap) ?? usable;
      if (p <= usable * (1 + 1e-9)) break;
      ap *= usable / p;
    }
    const derated = s.availablePowerKw < s.input.machine.spindlePowerKw * (1 - 1e-9);
    change(
      s,
      "spindle-power",
      "axialDepthMm",
      "length",
      ap,
      derated
        ? "At this speed your spindle gives less than its rated power (it holds torque, not power, below its rated speed), and the cut would need more than that with a safety margin, so the depth of cut is reduced until it fits."
        : "The cut would need more power than your spindle can give with a safety margin, so the depth of cut is reduced until it fits.",
    );
    if (derated) {
      const rpm = s.rpm;
      const available = s.availablePowerKw;
      warn(
        s,
        "power-limited-at-speed",
        `At ${Math.round(rpm)} rpm your spindle gives about ${say(units, available, "power")} of its ${say(units, s.input.machine.spindlePowerKw, "power")}; the depth of cut was reduced to fit.`,
        [{ name: "availablePowerKw", quantity: "power", value: s.availablePowerKw }],
      );
    }
    const sheetAp = s.input.operation.axialDepthMm;
    if (s.axialDepthMm < MIN_AXIAL_DEPTH_SHARE * sheetAp) {
      const ap = s.axialDepthMm;
      warn(
        s,
        "machine-too-small",
        `Your spindle is too weak for this operation: the depth of cut had to drop to ${say(units, ap, "length")}, below a tenth of the vendor's. Choose a smaller cutter or a lighter operation.`,
        [{ name: "axialDepthMm", quantity: "length", value: s.axialDepthMm }],
      );
    }
    s.meanChipThicknessMm = s.chipLoadMm * meanFactor(s, s.radialDepthMm, s.axialDepthMm);
  }
  // When the cut fits, ap and the chip are unchanged, so Pc is `first`; only a lowered ap is recomputed.
  s.powerKw = s.axialDepthMm === apBefore ? first : powerAt(s, s.axialDepthMm);
  if (s.powerKw === null) return;
  s.toolPowerKw = s.powerKw * s.input.spindleEfficiency;
  s.torqueNm = (60000 / (2 * Math.PI)) * (s.powerKw / s.rpm);
  if (s.input.ballNose) {
    s.effectiveDiameterMm = effectiveDiameter(s, s.axialDepthMm);
    s.cuttingSpeedMpm = (Math.PI * s.effectiveDiameterMm * s.rpm) / 1000;
  }
  s.forceN = (60000 * s.toolPowerKw) / s.cuttingSpeedMpm;
}
