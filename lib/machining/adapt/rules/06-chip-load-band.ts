import { say } from "../message-units";
import { change, hexFactor, warn, type AdaptState } from "../state";

/** Rule 6: hex above the band's ceiling comes down to it; a cutter whose ceiling is under the floor is told so plainly. */
export function chipLoadBand(s: AdaptState): void {
  const { minMm, maxMm, impossible } = s.input.band;
  const units = s.input.units;
  if (impossible) {
    warn(
      s,
      "chip-load-band-impossible",
      `This cutter is too small for this material: the largest chip it takes without breaking (${say(units, maxMm, "chipLoad")}) is under the smallest that cuts rather than rubs (${say(units, minMm, "chipLoad")}), so no chip load avoids both. Use a larger cutter or a single-flute cutter.`,
      [
        { name: "maxChipLoadMm", quantity: "chipLoad", value: maxMm },
        { name: "minChipLoadMm", quantity: "chipLoad", value: minMm },
      ],
    );
  }
  const factor = hexFactor(s, s.radialDepthMm, s.axialDepthMm);
  if (s.maxChipThicknessMm <= maxMm * (1 + 1e-9)) return;
  const { flutes } = s.input.operation;
  change(
    s,
    "chip-load-band",
    "chipLoadMm",
    "chipLoad",
    maxMm / factor,
    "The chip each tooth would take is above the largest this cutter carries in this material, where a small cutter breaks; the feed per tooth comes down to the band's ceiling.",
  );
  change(
    s,
    "chip-load-band",
    "feedMmMin",
    "feedRate",
    s.chipLoadMm * flutes * s.rpm,
    "With a smaller chip per tooth the feed comes down with it.",
  );
  s.maxChipThicknessMm = maxMm;
  s.targetHexMm = Math.min(s.targetHexMm, maxMm);
  warn(
    s,
    "chip-load-above-maximum",
    `The chip load is held at the most this cutter carries in this material (${say(units, maxMm, "chipLoad")} at the thickest chip); more would risk breaking it.`,
    [{ name: "maxChipThicknessMm", quantity: "chipLoad", value: maxMm }],
  );
}
