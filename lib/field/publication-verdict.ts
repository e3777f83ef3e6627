import { compareVersions } from "./compare-versions";
import type { Interval } from "./wilson";

// Pure: after a new version goes out, did failures fall? Only once the two versions' failure intervals separate;
// until then the answer is "not yet clear".

type Version = { number: number; publishedAt: string | null; failed: number; outcomes: number; failure: Interval };

export type PublicationVerdict = { verdict: "fell" | "rose" | "not_yet_clear" | "single_version"; headline: string; detail: string };

export function publicationVerdict(versions: Version[], confidenceLabel: string): PublicationVerdict {
  const published = versions.filter((v) => v.publishedAt).sort((a, b) => a.number - b.number);
  if (published.length < 2)
    return {
      verdict: "single_version",
      headline: "One version so far",
      detail: "Once a new version goes out, its failures are compared with this one's here.",
    };
  const current = published[published.length - 1];
  const previous = published[published.length - 2];
  const { verdict, sentence } = compareVersions(previous, current, confidenceLabel);
  if (verdict === "fewer_failures")
    return { verdict: "fell", headline: `Failures fell after version ${current.number} went out`, detail: sentence };
  if (verdict === "more_failures")
    return { verdict: "rose", headline: `Failures rose after version ${current.number} went out`, detail: sentence };
  return {
    verdict: "not_yet_clear",
    headline: `Not yet clear whether failures fell after version ${current.number} went out`,
    detail: sentence,
  };
}
