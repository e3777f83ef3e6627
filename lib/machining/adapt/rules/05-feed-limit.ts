import { say } from "../message-units";
import { change, hasWarning, hexFactor, warn, type AdaptState } from "../state";

/** Rule 5: vf = fz·z·n, capped at the machine's max feed; where hex then falls under the floor, n comes down. */
export function feedLimit(s: AdaptState): void {
  const { flutes } = s.input.operation;
  const { maxFeedMmMin, minRpm } = s.input.machine;
  const floor = s.input.band.minMm;
  const factor = hexFactor(s, s.radialDepthMm, s.axialDepthMm);
  const target = s.targetChipLoadMm;
  change(
    s,
    "feed-limit",
    "feedMmMin",
    "feedRate",
    target * flutes * s.rpm,
    "Feed rate is chip load × flutes × spindle speed; with a different speed or chip load the feed changes with them.",
  );
  if (s.feedMmMin > maxFeedMmMin) {
    change(
      s,
      "feed-limit",
      "feedMmMin",
      "feedRate",
      maxFeedMmMin,
      "This feed is faster than your machine can move, so it is held at the machine's maximum.",
    );
    warn(s, "feed-capped", `The feed is held at your machine's maximum feed rate, ${say(s.input.units, maxFeedMmMin, "feedRate")}.`, [
      { name: "maxFeedMmMin", quantity: "feedRate", value: maxFeedMmMin },
    ]);
    const capped = maxFeedMmMin / (flutes * s.rpm);
    if (floor > 0 && capped * factor < floor) {
      // The n at which the capped feed gives the wanted chip again (at least the floor).
      const restore = maxFeedMmMin / (flutes * Math.max(target, floor / factor));
      change(
        s,
        "feed-limit",
        "rpm",
        "spindleSpeed",
        Math.max(minRpm, Math.min(s.rpm, restore)),
        "At the capped feed each tooth would take a chip thinner than the material's minimum and rub instead of cut, which heats the part (plastics melt and weld to the tool). The spindle slows down so each tooth takes a full chip again.",
      );
    }
    change(
      s,
      "feed-limit",
      "chipLoadMm",
      "chipLoad",
      maxFeedMmMin / (flutes * s.rpm),
      "With the feed held at the machine's maximum, each tooth takes a smaller bite.",
    );
  }
  s.maxChipThicknessMm = s.chipLoadMm * factor;
  if (floor > 0 && s.maxChipThicknessMm < floor * (1 - 1e-9)) warnBelowFloor(s);
}

/** The chip the edge sees is under the band's floor: say so, with the feed that would restore it. */
export function warnBelowFloor(s: AdaptState): void {
  // Rule 12 checks again at the final numbers; the first warning stands, so its message is not built twice.
  if (hasWarning(s, "chip-load-below-minimum")) return;
  const { flutes } = s.input.operation;
  const floor = s.input.band.minMm;
  const factor = hexFactor(s, s.radialDepthMm, s.axialDepthMm);
  const neededFeed = (floor / factor) * flutes * s.rpm;
  const units = s.input.units;
  warn(
    s,
    "chip-load-below-minimum",
    `The chip each tooth takes, at its thickest, is below the material's minimum: the cutter will rub rather than cut, heating the tool and part (plastics melt and weld to the tool). It needs a feed of about ${say(units, neededFeed, "feedRate")} at this speed; use fewer flutes, a lower speed or a machine with a faster feed.`,
    [
      { name: "chipLoadMm", quantity: "chipLoad", value: s.chipLoadMm },
      { name: "maxChipThicknessMm", quantity: "chipLoad", value: s.chipLoadMm * factor },
      { name: "minChipLoadMm", quantity: "chipLoad", value: floor },
      { name: "feedMmMin", quantity: "feedRate", value: neededFeed },
    ],
  );
}
