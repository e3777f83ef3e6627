import { stringify } from "yaml";

type Fields = Record<string, unknown>;

/** One valid operation, as an author writes it (strings with units). Invented demo data. */
export function operationInput(overrides: Fields = {}): Fields {
  return {
    kind: "slotting",
    label: "Full-width slot",
    n: "18000 rpm",
    vf: "1800 mm/min",
    ap: "1.5 mm",
    ae: "100 %",
    plungeFeed: "500 mm/min",
    entry: "ramp",
    rampAngleDeg: 3,
    ...overrides,
  };
}

/** Valid front matter fields; `operations` replaces the list when given. */
export function frontMatterInput(overrides: Fields = {}): Fields {
  return {
    title: "Cast acrylic, 1/8 in single-flute cutter",
    summary: "Starting data for slots and profiles in cast acrylic on a light router.",
    cutter: "SF-125-O",
    material: "cast-acrylic",
    machineClass: "light-router",
    operations: [
      operationInput(),
      operationInput({ kind: "profile", label: "Outside profile", ae: "0.5 mm", ap: "3 mm", entry: "none", rampAngleDeg: undefined }),
    ],
    cautions: [{ kind: "melting", text: "Keep the feed up: a rubbing cutter melts acrylic." }],
    tags: ["acrylic", "single-flute"],
    ...overrides,
  };
}

export const defaultBody = [
  "## Before you cut",
  "",
  "Clamp the sheet flat and [read the workholding notes](https://example.com/notes).",
  "",
  '<Caution kind="melting" title="Chips must leave the cut">',
  "Use air blast. Chips that stay in the slot weld to the cutter.",
  "</Caution>",
  "",
  "<OperationTable />",
  "",
  '<AdaptPanel operation="0" />',
  "",
  '<Figure src="images/slot.png" alt="A clean slot in clear acrylic" caption="Slot at the feed above" />',
  "",
].join("\n");

/** A whole sheet source: `---`, YAML front matter, `---`, MDX body. */
export function buildSheetSource(options: { frontMatter?: Fields; yaml?: string; body?: string } = {}): string {
  const yaml = options.yaml ?? stringify(frontMatterInput(options.frontMatter));
  return `---\n${yaml.replace(/\n$/, "")}\n---\n${options.body ?? defaultBody}`;
}

/** 1-based line of the first line containing `needle` (after `from`, when given). */
export function lineOf(source: string, needle: string, from = 1): number {
  const lines = source.split("\n");
  const index = lines.findIndex((line, i) => i + 1 >= from && line.includes(needle));
  if (index === -1) throw new Error(`“${needle}” is not in the source`);
  return index + 1;
}
