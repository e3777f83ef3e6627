// The relevance table over the demo seed (seeds/sheets/demo-sheet-plan.ts): each query with the sheet
// that must come first (`top: 1`) or among the first three (`top: 3`, where the demo has near-twins).
// Slugs follow the seed: `${material slug}-${cutter sku}-${machine class slug}`.
export type RelevanceCase = { vendor: "northbeck" | "quillon"; q: string; expect: string; top: 1 | 3; why: string };

const nb = (q: string, expect: string, top: 1 | 3, why: string): RelevanceCase => ({ vendor: "northbeck", q, expect, top, why });
const qc = (q: string, expect: string, top: 1 | 3, why: string): RelevanceCase => ({ vendor: "quillon", q, expect, top, why });

export const RELEVANCE_CASES: RelevanceCase[] = [
  nb("1/8 acrylic slot", "cast-acrylic-nb-sf-3175-light-router", 3, "fraction, material, operation"),
  nb("1/8 2F acrylic slot", "cast-acrylic-nb-sf-3175-rigid-router", 3, "no 2-flute 1/8 cutter: flutes relaxed, diameter kept"),
  nb('0.125" acrylic', "cast-acrylic-nb-sf-3175-rigid-router", 3, "decimal inches"),
  nb("3.175 mm acrylic", "cast-acrylic-nb-sf-3175-light-router", 3, "the same diameter in mm"),
  nb("3.175mm cast acrylic", "cast-acrylic-nb-sf-3175-rigid-router", 3, "glued unit, narrower material"),
  nb("1/8 inch polycarbonate", "polycarbonate-nb-sf-3175-light-router", 1, "inch word"),
  nb("PMMA 1/4", "cast-acrylic-nb-sf-6350-rigid-router", 1, "synonym PMMA"),
  nb("plexi 6.35mm", "cast-acrylic-nb-sf-6350-rigid-router", 1, "synonym plexi, mm form of 1/4"),
  nb("acrylic glass", "cast-acrylic-nb-sf-3175-light-router", 3, "synonym phrase"),
  nb("alumnium", "aluminium-6061-nb-3f-6-rigid-router", 3, "typo"),
  nb("aluminum trochoidal", "aluminium-6061-nb-3f-6-light-router", 3, "US spelling, adaptive trade word"),
  nb("6061 light router", "aluminium-6061-nb-3f-6-light-router", 1, "alloy number and machine class words"),
  nb("NB-CMP-635", "plywood-nb-cmp-635-light-router", 3, "SKU"),
  nb("nb-sf-6350 hdpe", "hdpe-nb-sf-6350-light-router", 1, "lower-case SKU and material"),
  nb("hdpe 1/4 single flute", "hdpe-nb-sf-6350-light-router", 1, "geometry words"),
  nb("ball nose mdf", "mdf-nb-bn-6-rigid-router", 1, "corner form"),
  nb("ballnose oak", "hardwood-oak-nb-bn-6-rigid-router", 1, "corner form glued, species word for hardwood"),
  nb("compression plywood light", "plywood-nb-cmp-635-light-router", 1, "geometry, material, machine class word"),
  nb("oak compression", "hardwood-oak-nb-cmp-635-rigid-router", 1, "species and geometry"),
  nb("oak up-cut", "hardwood-oak-nb-2f-6-light-router", 3, "geometry"),
  nb("mdf profile 6mm", "mdf-nb-2f-6-light-router", 1, "6 mm excludes the 6.35 mm compression cutter"),
  nb("contour mdf 1/4", "mdf-nb-cmp-635-rigid-router", 1, "contour = profile, 1/4 = 6.35 mm"),
  nb("polycarbonat", "polycarbonate-nb-sf-3175-light-router", 3, "typo (dropped letter)"),
  nb("acrilic", "cast-acrylic-nb-sf-3175-light-router", 3, "typo (i for y)"),
  nb("plywod", "plywood-nb-2f-6-rigid-router", 3, "typo (dropped letter)"),
  nb("polyethylene", "hdpe-nb-sf-3175-rigid-router", 3, "synonym of HDPE"),
  nb("HDPE 6mm", "hdpe-nb-2f-6-light-router", 1, "material and diameter"),
  nb("1/4 plastic slot", "cast-acrylic-nb-sf-6350-rigid-router", 3, "material group word"),
  nb("birch ply", "plywood-nb-2f-6-rigid-router", 3, "synonym phrase"),
  nb("medium density fibreboard", "mdf-nb-2f-6-light-router", 3, "spelled-out MDF"),
  nb("6 mm 3 flute aluminium", "aluminium-6061-nb-3f-6-rigid-router", 3, "flute count words"),
  qc("3mm O-flute acrylic", "cast-acrylic-qc-o1-3-light-router", 3, "O-flute geometry"),
  qc("carbon fibre 8mm", "carbon-fibre-qc-e3-8-small-machining-centre", 1, "composite and diameter"),
  qc("CFRP", "carbon-fibre-qc-e2-4-small-machining-centre", 3, "composite abbreviation"),
  qc("maple down-cut", "hardwood-maple-qc-e2-4-light-router", 3, "species and geometry"),
  qc("bull aluminium", "aluminium-6061-qc-e3-8-small-machining-centre", 3, "corner radius word"),
  qc("QC-B2-3", "hardwood-maple-qc-b2-3-rigid-router", 3, "SKU"),
  qc("extruded pmma 6mm", "cast-acrylic-qc-o1-6-rigid-router", 3, "a narrower material than indexed: relaxed to acrylic, diameter kept"),
];
