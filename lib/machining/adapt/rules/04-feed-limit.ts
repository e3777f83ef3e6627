import { change, warn, type AdaptState } from "../state";

/** Rule 4: vf = fz·z·n, capped at the machine's max feed; n comes down if fz would fall below the minimum. */
export function feedLimit(s: AdaptState): void {
  const { flutes } = s.input.operation;
  const { maxFeedMmMin, minRpm } = s.input.machine;
  const { minChipLoadMm } = s.input.material;
  const target = s.targetChipLoadMm;
  change(s, "feed-limit", "feedMmMin", "feedRate", target * flutes * s.rpm, "Feed rate is chip load × flutes × spindle speed; with a different speed or chip load the feed changes with them.");
  if (s.feedMmMin > maxFeedMmMin) {
    change(s, "feed-limit", "feedMmMin", "feedRate", maxFeedMmMin, "This feed is faster than your machine can move, so it is held at the machine's maximum.");
    warn(s, "feed-capped", "The feed is held at your machine's maximum feed rate.", [{ name: "maxFeedMmMin", quantity: "feedRate", value: maxFeedMmMin }]);
    const capped = maxFeedMmMin / (flutes * s.rpm);
    if (minChipLoadMm !== undefined && capped < minChipLoadMm) {
      change(
        s,
        "feed-limit",
        "rpm",
        "spindleSpeed",
        Math.max(minRpm, maxFeedMmMin / (flutes * target)),
        "At the capped feed each tooth would take a chip thinner than the material's minimum and rub instead of cut, which heats the part (plastics melt and weld to the tool). The spindle slows down so each tooth takes a full chip again.",
      );
    }
    change(s, "feed-limit", "chipLoadMm", "chipLoad", maxFeedMmMin / (flutes * s.rpm), "With the feed held at the machine's maximum, each tooth takes a smaller bite.");
  }
  if (minChipLoadMm !== undefined && s.chipLoadMm < minChipLoadMm * (1 - 1e-9)) {
    warn(
      s,
      "chip-load-below-minimum",
      "The chip load is below the material's minimum: the cutter will rub rather than cut, heating the tool and part (plastics melt and weld to the tool). Use a cutter with fewer flutes or a machine with a faster feed.",
      [
        { name: "chipLoadMm", quantity: "chipLoad", value: s.chipLoadMm },
        { name: "minChipLoadMm", quantity: "chipLoad", value: minChipLoadMm },
      ],
    );
  }
}
