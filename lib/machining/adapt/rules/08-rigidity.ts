import { change, type AdaptState } from "../state";

/** Rule 8: ap scales with machine rigidity relative to the sheet's machine class, never above the sheet's ap. */
export function rigidity(s: AdaptState): void {
  const sheetAp = s.input.operation.axialDepthMm;
  const share = Math.min(1, s.input.machine.rigidity / s.input.referenceRigidity);
  const limit = sheetAp * share;
  if (s.axialDepthMm > limit) {
    change(
      s,
      "rigidity",
      "axialDepthMm",
      "length",
      limit,
      "Your machine is less rigid than the vendor's test machine, so the depth of cut is reduced in proportion to keep chatter and tool load down.",
    );
  }
}
