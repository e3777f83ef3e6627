import { randomUUID } from "node:crypto";

import { buildSheetDocument, type SheetDocumentSource } from "@/search/document/build-sheet-document";
import type { SearchDocument } from "@/search/document/document-schema";

type Overrides = {
  vendorId?: string;
  slug?: string;
  title?: string;
  sku?: string;
  cutterName?: string;
  diameterMm?: number;
  flutes?: number;
  cornerForm?: string;
  geometry?: string;
  material?: { slug: string; name: string; group: string; synonyms?: string[] };
  kinds?: string[];
  machineClass?: string;
  tags?: string[];
  body?: string;
};

/** Builder input for one sheet: cast acrylic, 1/8 in single flute, slotting + profile, unless overridden. */
export function sheetSource(o: Overrides = {}): SheetDocumentSource {
  const kinds = o.kinds ?? ["slotting", "profile"];
  return {
    vendorId: o.vendorId ?? randomUUID(),
    sheet: { id: randomUUID(), slug: o.slug ?? "cast-acrylic-sf-3175" },
    version: {
      id: randomUUID(),
      number: 2,
      title: o.title ?? "Cast acrylic, 1/8 in single-flute",
      source: `---\ntitle: x\n---\n## About\n\n${o.body ?? "Keep the chips moving."}\n\n<Caution kind="melting">Air blast.</Caution>\n`,
      frontMatter: { summary: "Slot and profile in cast acrylic.", operations: kinds.map((kind) => ({ kind })), tags: o.tags ?? ["demo"] },
      publishedAt: new Date("2026-05-01T00:00:00Z"),
    },
    cutter: {
      id: randomUUID(),
      sku: o.sku ?? "T-SF-3175",
      name: o.cutterName ?? "1/8 in single-flute plastic cutter",
      diameterMm: o.diameterMm ?? 3.175,
      flutes: o.flutes ?? 1,
      cornerForm: o.cornerForm ?? "square",
      geometry: o.geometry ?? "single-flute",
    },
    material: { synonyms: [], ...(o.material ?? { slug: "cast-acrylic", name: "Cast acrylic", group: "plastics", synonyms: ["PMMA"] }) },
    machineClass: { slug: o.machineClass ?? "light-router", name: `${(o.machineClass ?? "light-router").replace(/-/g, " ")}` },
  };
}

export const sheetDoc = (o: Overrides = {}): SearchDocument => buildSheetDocument(sheetSource(o));
