import { chipThinningFactor } from "../../formulas/engagement";
import { change, type AdaptState } from "../state";

/** Rule 1: fz = vf/(z·n) of the vendor's cut, and the hex it gives at the sheet's ae. */
export function referenceChipLoad(s: AdaptState): void {
  const { diameterMm, flutes, rpm, feedMmMin, radialDepthMm } = s.input.operation;
  const fz = feedMmMin / (flutes * rpm);
  s.chipLoadMm = fz;
  s.maxChipThicknessMm = fz;
  change(
    s,
    "reference-chip-load",
    "maxChipThicknessMm",
    "chipLoad",
    fz / chipThinningFactor({ diameterMm, radialDepthMm }),
    "The vendor's cut takes less than half the cutter width, so each tooth is in the material for a short arc and its thickest chip is thinner than the feed per tooth. That chip thickness is what the adaptation holds.",
  );
  s.targetHexMm = s.maxChipThicknessMm;
  s.targetChipLoadMm = fz;
}
