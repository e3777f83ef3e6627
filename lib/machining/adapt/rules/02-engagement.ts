import { MachiningInputError } from "../../errors";
import { FULL_WIDTH_SHARE, MIN_RADIAL_ENGAGEMENT, SLOT_DEPTH_SHARE } from "../defaults";
import { say } from "../message-units";
import { change, hexFactor, warn, type AdaptState } from "../state";

/**
 * Rule 2: a new ae holds hex (fz = hex·CTF(ae)); going to full width from an operation that is not
 * a slot applies the slotting factor to fz and caps ap at 0.7× the sheet's; an ap override is a step.
 */
export function engagement(s: AdaptState): void {
  const { diameterMm: d, radialDepthMm: sheetAe, axialDepthMm: sheetAp } = s.input.operation;
  const kind = s.input.kind;
  const units = s.input.units;
  const apOverride = s.input.overrides.axialDepthMm;
  if (apOverride !== undefined && apOverride > sheetAp * (1 + 1e-9)) {
    warn(
      s,
      "axial-depth-override-capped",
      `Your axial depth (${say(units, apOverride, "length")}) is deeper than the vendor tested; the sheet's ${say(units, sheetAp, "length")} is used instead.`,
      [{ name: "axialDepthMm", quantity: "length", value: sheetAp }],
      "overrides.axialDepthMm",
    );
  } else if (apOverride !== undefined) {
    change(
      s,
      "radial-chip-thinning",
      "axialDepthMm",
      "length",
      apOverride,
      "You set this depth of cut; the rules below may still reduce it.",
    );
  }
  const ae = s.input.overrides.radialDepthMm;
  if (ae === undefined || Math.abs(ae - sheetAe) <= 1e-9 * sheetAe) return;
  if (ae < MIN_RADIAL_ENGAGEMENT * d) {
    throw new MachiningInputError(
      "overrides.radialDepthMm",
      `overrides.radialDepthMm (${say(units, ae, "length")}) is under 5 % of the ${say(units, d, "length")} cutter; chip thinning is not extrapolated that far. Use at least ${say(units, MIN_RADIAL_ENGAGEMENT * d, "length")}.`,
    );
  }
  s.radialDepthMm = Math.min(ae, d);
  change(
    s,
    "radial-chip-thinning",
    "chipLoadMm",
    "chipLoad",
    s.targetHexMm / hexFactor(s, s.radialDepthMm, sheetAp),
    ae < sheetAe
      ? "A narrower cut makes thinner chips at the same feed per tooth; the feed per tooth goes up so the chip stays as thick as in the vendor's test and the cutter does not rub."
      : "A wider cut makes thicker chips at the same feed per tooth; the feed per tooth comes down so the chip stays as thick as in the vendor's test.",
  );
  if (kind !== "slotting" && ae >= FULL_WIDTH_SHARE * d && sheetAe < FULL_WIDTH_SHARE * d) {
    const factor = s.input.slottingFactor;
    change(
      s,
      "radial-chip-thinning",
      "chipLoadMm",
      "chipLoad",
      s.chipLoadMm * factor,
      `A full-width slot has both walls against the cutter and nowhere for the chips to go, so it runs at ${Math.round(factor * 100)} % of the feed per tooth of a part-width cut.`,
    );
    s.targetHexMm *= factor;
    const apLimit = SLOT_DEPTH_SHARE * sheetAp;
    if (s.axialDepthMm > apLimit) {
      change(
        s,
        "radial-chip-thinning",
        "axialDepthMm",
        "length",
        apLimit,
        `A full-width slot is cut shallower than the vendor's part-width cut: at most ${Math.round(SLOT_DEPTH_SHARE * 100)} % of its depth.`,
      );
    }
    warn(
      s,
      "slotting-factor-applied",
      `Cutting the full width: the feed per tooth is ${Math.round(factor * 100)} % of the vendor's and the depth at most ${say(units, apLimit, "length")}, because the slot walls rub and chips are harder to clear.`,
      [
        { name: "chipLoadMm", quantity: "chipLoad", value: s.chipLoadMm },
        { name: "axialDepthMm", quantity: "length", value: Math.min(s.axialDepthMm, apLimit) },
      ],
    );
  }
  s.targetChipLoadMm = s.chipLoadMm;
}
