import { aluminiumAlloys } from "./aluminium-alloys";
import type { MaterialEntry } from "./types";

// Generic and trade words only: brand names are left out wherever a generic word exists.
const plastics: MaterialEntry[] = [
  {
    key: "acrylic",
    label: "acrylic (PMMA)",
    group: "plastics",
    terms: ["acrylic", "PMMA", "plexiglass", "plexi", "acrylic glass", "acrylic sheet"],
  },
  { key: "acrylic-cast", label: "cast acrylic", group: "plastics", parent: "acrylic", terms: ["cast acrylic", "cast PMMA"] },
  {
    key: "acrylic-extruded",
    label: "extruded acrylic",
    group: "plastics",
    parent: "acrylic",
    terms: ["extruded acrylic", "extruded PMMA"],
  },
  { key: "hdpe", label: "HDPE", group: "plastics", terms: ["HDPE", "PEHD", "polyethylene", "high-density polyethylene"] },
  { key: "polycarbonate", label: "polycarbonate", group: "plastics", terms: ["polycarbonate"], looseTerms: ["PC"] },
  { key: "acetal", label: "acetal (POM)", group: "plastics", terms: ["acetal", "POM", "polyoxymethylene", "polyacetal"] },
  { key: "nylon", label: "nylon (PA)", group: "plastics", terms: ["nylon", "polyamide", "PA6", "PA66"] },
];

const wood: MaterialEntry[] = [
  {
    key: "mdf",
    label: "MDF",
    group: "wood",
    terms: ["MDF", "medium density fibreboard", "medium density fiberboard", "fibreboard", "fiberboard"],
  },
  { key: "plywood", label: "plywood", group: "wood", terms: ["plywood", "ply", "birch plywood", "baltic birch"] },
  {
    key: "hardwood",
    label: "hardwood",
    group: "wood",
    terms: ["hardwood"],
    looseTerms: ["oak", "maple", "walnut", "beech", "ash", "cherry"],
  },
  { key: "softwood", label: "softwood", group: "wood", terms: ["softwood"], looseTerms: ["pine", "spruce", "fir"] },
];

const metals: MaterialEntry[] = [
  {
    key: "aluminium",
    label: "aluminium",
    group: "non-ferrous",
    terms: ["aluminium", "aluminum", "alu", "aluminium alloy", "aluminum alloy"],
  },
  ...aluminiumAlloys,
  { key: "brass", label: "brass", group: "non-ferrous", terms: ["brass"] },
  { key: "copper", label: "copper", group: "non-ferrous", terms: ["copper"] },
  { key: "steel", label: "steel", group: "ferrous", terms: ["steel", "mild steel", "carbon steel", "low carbon steel"] },
  { key: "stainless-steel", label: "stainless steel", group: "ferrous", terms: ["stainless", "stainless steel", "inox"] },
];

const composites: MaterialEntry[] = [
  {
    key: "cfrp",
    label: "carbon fibre (CFRP)",
    group: "composites",
    terms: [
      "carbon fibre",
      "carbon fiber",
      "CFRP",
      "carbon composite",
      "carbon fibre reinforced plastic",
      "carbon fiber reinforced plastic",
    ],
    looseTerms: ["carbon"],
  },
  {
    key: "g10",
    label: "G10/FR4 glass epoxy",
    group: "composites",
    terms: ["G10", "FR4", "G10/FR4", "glass epoxy", "glass composite", "fibreglass", "fiberglass", "GFRP", "glass fibre", "glass fiber"],
  },
];

export const materials: readonly MaterialEntry[] = [...plastics, ...wood, ...metals, ...composites];
