import { say } from "../message-units";
import { hasWarning, hexFactor, meanFactor, warn, type AdaptState } from "../state";
import { warnBelowFloor } from "./05-feed-limit";
import { cuttingSpeedWindow } from "./07-cutting-speed-window";

/**
 * Rule 12: the refusals (cutter outside 0.1–100 mm, ap above the flute length, stick-out above
 * 20·D) ran before rule 1; here the warnings, and the chip and speed checks again at the final
 * numbers (a ball nose's De moves with ap, which rules 8 and 9 may have lowered).
 */
export function sanityLimits(s: AdaptState): void {
  const { fluteLengthMm } = s.input.operation;
  const given = s.input.stickoutMm;
  if (given !== undefined && fluteLengthMm !== undefined && given < fluteLengthMm * (1 - 1e-9)) {
    const units = s.input.units;
    const field = s.input.overrides.stickoutMm === undefined ? "operation.stickoutMm" : "overrides.stickoutMm";
    warn(
      s,
      "stickout-below-flute-length",
      `The stick-out (${say(units, given, "length")}) is shorter than the flute length (${say(units, fluteLengthMm, "length")}); the collet cannot grip the flutes, so deflection was judged at the flute length.`,
      [{ name: "stickoutMm", quantity: "length", value: fluteLengthMm }],
      field,
    );
  }
  s.maxChipThicknessMm = s.chipLoadMm * hexFactor(s, s.radialDepthMm, s.axialDepthMm);
  s.meanChipThicknessMm = s.chipLoadMm * meanFactor(s, s.radialDepthMm, s.axialDepthMm);
  const floor = s.input.band.minMm;
  if (floor > 0 && s.maxChipThicknessMm < floor * (1 - 1e-9) && !hasWarning(s, "chip-load-band-impossible")) warnBelowFloor(s);
  if (s.input.ballNose) cuttingSpeedWindow(s);
}
