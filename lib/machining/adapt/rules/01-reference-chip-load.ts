import { change, effectiveDiameter, hexFactor, meanFactor, type AdaptState } from "../state";

/** Rule 1: fz = vf/(z·n) of the vendor's cut, and the hex and hm it gives at the sheet's ae (and ap, for a ball nose). */
export function referenceChipLoad(s: AdaptState): void {
  const { flutes, rpm, feedMmMin, radialDepthMm, axialDepthMm } = s.input.operation;
  const ballNose = s.input.ballNose;
  const fz = feedMmMin / (flutes * rpm);
  s.chipLoadMm = fz;
  s.maxChipThicknessMm = fz;
  s.effectiveDiameterMm = effectiveDiameter(s, axialDepthMm);
  const shallowBall = ballNose && s.effectiveDiameterMm < s.input.operation.diameterMm;
  change(
    s,
    "reference-chip-load",
    "maxChipThicknessMm",
    "chipLoad",
    fz * hexFactor(s, radialDepthMm, axialDepthMm),
    shallowBall
      ? "The vendor's ball nose cuts shallow, so its edge meets the material on a smaller circle than its full diameter and its thickest chip is thinner than the feed per tooth. That chip thickness is what the adaptation holds."
      : "The vendor's cut takes less than half the cutter width, so each tooth is in the material for a short arc and its thickest chip is thinner than the feed per tooth. That chip thickness is what the adaptation holds.",
  );
  s.meanChipThicknessMm = fz * meanFactor(s, radialDepthMm, axialDepthMm);
  s.targetHexMm = s.maxChipThicknessMm;
  s.targetChipLoadMm = fz;
}
