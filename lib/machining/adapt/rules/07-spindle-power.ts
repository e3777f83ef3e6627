import { MIN_AXIAL_DEPTH_SHARE } from "../defaults";
import { change, warn, type AdaptState } from "../state";

/** Pc = ap·ae·vf·kc / (60·10⁶·η) with the state's current numbers. */
export const statePowerKw = (s: AdaptState, kc: number) =>
  (s.axialDepthMm * s.radialDepthMm * s.feedMmMin * kc) / (60e6 * s.input.spindleEfficiency);

/** Rule 7: if Pc exceeds the usable spindle power, reduce ap until it fits. */
export function spindlePower(s: AdaptState): void {
  const kc = s.input.material.specificCuttingForceNmm2;
  if (kc === undefined) {
    warn(s, "no-cutting-force-data", "This material has no specific cutting force on file, so spindle power, cutting force, deflection and plunge thrust were not checked.");
    return;
  }
  const usable = s.input.machine.spindlePowerKw * s.input.usablePowerFraction;
  const power = statePowerKw(s, kc);
  if (power > usable) {
    change(s, "spindle-power", "axialDepthMm", "length", (s.axialDepthMm * usable) / power, "The cut would need more power than your spindle can give with a safety margin, so the depth of cut is reduced until it fits.");
    const sheetAp = s.input.operation.axialDepthMm;
    if (s.axialDepthMm < MIN_AXIAL_DEPTH_SHARE * sheetAp) {
      warn(s, "machine-too-small", "Your spindle is too weak for this operation: the depth of cut had to drop below a tenth of the vendor's. Choose a smaller cutter or a lighter operation.", [
        { name: "axialDepthMm", quantity: "length", value: s.axialDepthMm },
      ]);
    }
  }
  s.powerKw = statePowerKw(s, kc);
  s.toolPowerKw = s.powerKw * s.input.spindleEfficiency;
  s.torqueNm = (60000 / (2 * Math.PI)) * (s.powerKw / s.rpm);
  s.forceN = (60000 * s.toolPowerKw) / s.cuttingSpeedMpm;
}
