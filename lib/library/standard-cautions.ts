import type { SheetCaution } from "@/content-schema/sheet-front-matter";

/** Shown on every sheet, whatever its author wrote. */
export const STANDARD_CAUTIONS: SheetCaution[] = [
  {
    kind: "general",
    text: "These are starting points, not guarantees. Start with the feed override turned down and bring it up while you watch the chips.",
  },
  { kind: "eye", text: "Wear eye and hearing protection; chips and broken cutters fly." },
  { kind: "dust", text: "Run dust extraction; fine dust is a health and fire risk." },
  { kind: "fire", text: "Never leave a cut unattended." },
  {
    kind: "clamping",
    text: "Follow the machine maker's limits, local codes and workplace rules; check workholding and tool clamping first.",
  },
];
