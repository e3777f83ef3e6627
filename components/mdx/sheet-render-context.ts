import type { ReactNode } from "react";

import type { SheetFrontMatter, SheetOperation } from "@/content-schema/sheet-front-matter";
import type { UnitSystem } from "@/lib/machining";

/** What the sheet's components need beyond their MDX props; given by the page that renders. */
export type SheetRenderContext = {
  frontMatter: SheetFrontMatter;
  units: UnitSystem;
  /** From the catalogue: the front matter names the cutter only by SKU. */
  cutter?: { flutes?: number; diameterMm?: number };
  /** Mounts the interactive adapt panel inside its slot; without it the slot shows a pointer line. */
  renderAdaptPanel?: (slot: { index: number; operation: SheetOperation }) => ReactNode;
  /** Maps a relative figure path to where the image is served. */
  resolveImageSrc?: (src: string) => string;
};
