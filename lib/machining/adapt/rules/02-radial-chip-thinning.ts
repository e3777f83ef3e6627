import { MachiningInputError } from "../../errors";
import { chipLoadForThickness } from "../../formulas/engagement";
import { show } from "../../validate";
import { MIN_RADIAL_ENGAGEMENT } from "../defaults";
import { change, type AdaptState } from "../state";

/** Rule 2: a different ae keeps the reference hex, so fz = hex · CTF(ae). */
export function radialChipThinning(s: AdaptState): void {
  const { diameterMm, radialDepthMm } = s.input.operation;
  const ae = s.input.overrides.radialDepthMm;
  if (ae === undefined || Math.abs(ae - radialDepthMm) <= 1e-9 * radialDepthMm) return;
  if (ae < MIN_RADIAL_ENGAGEMENT * diameterMm) {
    throw new MachiningInputError(
      "overrides.radialDepthMm",
      `overrides.radialDepthMm (${show(ae)} mm) is under 5 % of the ${show(diameterMm)} mm cutter; chip thinning is not extrapolated that far. Use at least ${show(MIN_RADIAL_ENGAGEMENT * diameterMm)} mm.`,
    );
  }
  s.radialDepthMm = ae;
  const increase = ae < radialDepthMm;
  change(
    s,
    "radial-chip-thinning",
    "chipLoadMm",
    "chipLoad",
    chipLoadForThickness({ diameterMm, radialDepthMm: ae, maxChipThicknessMm: s.targetHexMm }),
    increase
      ? "A narrower cut makes thinner chips at the same feed per tooth; the feed per tooth goes up so the chip stays as thick as in the vendor's test and the cutter does not rub."
      : "A wider cut makes thicker chips at the same feed per tooth; the feed per tooth comes down so the chip stays as thick as in the vendor's test.",
  );
  s.targetChipLoadMm = s.chipLoadMm;
}
