import { stringify } from "yaml";

import type { SheetCaution } from "@/content-schema/sheet-front-matter";

import type { DerivedOperation } from "./derive-starting-data";

export type TemplateInput = {
  title: string;
  summary: string;
  cutterSku: string;
  materialSlug: string;
  machineClassSlug: string;
  operations: DerivedOperation[];
  cautions?: SheetCaution[];
  tags?: string[];
  body: string;
};

/** A whole sheet source (YAML front matter between `---` lines, then MDX) from structured parts. */
export function buildSheetSourceText({
  title,
  summary,
  cutterSku,
  materialSlug,
  machineClassSlug,
  operations,
  cautions = [],
  tags = [],
  body,
}: TemplateInput): string {
  const ops = operations.map(({ derived: _derived, ...op }) => Object.fromEntries(Object.entries(op).filter(([, v]) => v !== undefined)));
  const yaml = stringify(
    { title, summary, cutter: cutterSku, material: materialSlug, machineClass: machineClassSlug, operations: ops, cautions, tags },
    { lineWidth: 0 },
  );
  return `---\n${yaml.trimEnd()}\n---\n${body.trimEnd()}\n`;
}
