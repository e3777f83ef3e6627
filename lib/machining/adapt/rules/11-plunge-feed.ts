import { PLUNGE_FEED_EXPONENT, PLUNGE_THRUST_A, PLUNGE_THRUST_B } from "../../formulas/plunge";
import { say } from "../message-units";
import { hasWarning, record, warn, type AdaptState } from "../state";

const RAMPED = new Set(["ramp", "helical", "drilling"]);

const RAMP_ADVICE =
  "Enter with a ramp or a helix instead of a straight plunge: the cutter then cuts on its side, which takes far less axial force, and allows deeper passes.";

/** Ff = A·kc·D·fn^0.8 + B·kc·D² (form of Machinery's Handbook's drilling thrust; A and B calibrated). */
const thrust = (d: number, kc: number, fn: number) => PLUNGE_THRUST_A * kc * d * fn ** PLUNGE_FEED_EXPONENT + PLUNGE_THRUST_B * kc * d * d;

/** The Z thrust in the caller's units, saying when it is the rigidity class's default. */
function zText(s: AdaptState): string {
  const { zThrustN, zThrustAssumed, rigidityClass } = s.input;
  const force = say(s.input.units, zThrustN, "force");
  return zThrustAssumed ? `${force} (assumed for a ${rigidityClass} machine; enter your Z axis thrust if you know it)` : force;
}

/** Rule 11: hold fn from the sheet; cap it where the thrust exceeds the Z axis; refuse a straight plunge the centre alone cannot make. */
export function plungeFeed(s: AdaptState): void {
  const { diameterMm: d, plungeFeedMmMin, rpm: refRpm } = s.input.operation;
  const kind = s.input.kind;
  const zThrustN = s.input.zThrustN;
  const maxFeedMmMin = s.input.machine.maxFeedMmMin;
  const units = s.input.units;
  if (d >= s.input.rampThresholdDiameterMm && !RAMPED.has(kind)) {
    warn(
      s,
      "ramp-entry-recommended",
      `For a cutter this size, enter with a ramp or a helix rather than a straight plunge: a large cutter needs a lot of axial force to plunge, and a ramp allows deeper cuts.`,
    );
  }
  if (plungeFeedMmMin === undefined) return;
  let fn = plungeFeedMmMin / refRpm;
  let feed = fn * s.rpm;
  s.plungeFeedMmMin = plungeFeedMmMin;
  record(
    s,
    "plunge-feed",
    "plungeFeedMmMin",
    "feedRate",
    plungeFeedMmMin,
    feed,
    "The plunge keeps the vendor's feed per revolution, so the plunge feed follows the spindle speed.",
  );
  const kc = s.input.force?.kc11Nmm2;
  const plungeOnly = s.input.entryCapability === "plunge-only";
  if (kc !== undefined) {
    const centre = PLUNGE_THRUST_B * kc * d * d;
    if (centre >= zThrustN) {
      s.plungeFeedMmMin = null;
      s.plungeThrustN = centre;
      warn(
        s,
        "straight-plunge-refused",
        plungeOnly
          ? `Your Z axis (${zText(s)}) cannot push this cutter straight into this material at any feed: the centre of the cutter alone needs about ${say(units, centre, "force")}. Your CAM can only plunge straight, so use a pre-drilled hole, a smaller cutter, or a CAM that ramps or helixes in.`
          : `Your Z axis (${zText(s)}) cannot push this cutter straight into this material at any feed: the centre of the cutter alone needs about ${say(units, centre, "force")}. A ramp or helical entry is required.`,
        [
          { name: "plungeThrustN", quantity: "force", value: centre },
          { name: "zThrustN", quantity: "force", value: zThrustN },
        ],
        "machine.zThrustN",
      );
      warn(s, "ramp-entry-recommended", RAMP_ADVICE);
      return;
    }
    const fnMax = ((zThrustN - centre) / (PLUNGE_THRUST_A * kc * d)) ** (1 / PLUNGE_FEED_EXPONENT);
    if (fn > fnMax) {
      fn = fnMax;
      const z = zText(s);
      record(
        s,
        "plunge-feed",
        "plungeFeedMmMin",
        "feedRate",
        feed,
        fn * s.rpm,
        `Pushing the cutter straight down at this feed would take more force than your Z axis gives (${z}); a light Z axis stalls or loses steps, so the feed per revolution is lowered until the thrust fits.`,
      );
      feed = fn * s.rpm;
      const held = feed;
      warn(
        s,
        "plunge-thrust-limited",
        `The plunge feed is held to ${say(units, held, "feedRate")} by your Z axis thrust, ${z}.`,
        [
          { name: "plungeFeedMmMin", quantity: "feedRate", value: feed },
          { name: "zThrustN", quantity: "force", value: zThrustN },
        ],
        "machine.zThrustN",
      );
      if (!hasWarning(s, "ramp-entry-recommended")) {
        warn(
          s,
          "ramp-entry-recommended",
          plungeOnly
            ? `${RAMP_ADVICE} Your CAM can only plunge straight; if it can be set to ramp, this cut gets faster and safer.`
            : RAMP_ADVICE,
        );
      }
    }
  }
  if (feed > maxFeedMmMin) {
    record(
      s,
      "plunge-feed",
      "plungeFeedMmMin",
      "feedRate",
      feed,
      maxFeedMmMin,
      "This plunge feed is faster than your machine can move, so it is held at the machine's maximum.",
    );
    feed = maxFeedMmMin;
    fn = feed / s.rpm;
  }
  s.plungeFeedMmMin = feed;
  s.plungeFeedPerRevMm = fn;
  if (kc !== undefined) s.plungeThrustN = thrust(d, kc, fn);
}
