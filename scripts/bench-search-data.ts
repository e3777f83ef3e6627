// Synthetic catalogues and published sheets for scripts/bench-search.ts and scripts/bench-field.ts (invented data, seeded PRNG).
import type { Knex } from "knex";

import { OPERATION_KINDS } from "../lib/machining/types";
import { prng } from "./lib/prng";

const rand = prng(0xbe7c4);
export const pick = <T>(list: readonly T[]) => list[Math.floor(rand() * list.length)];

const SIZES = [
  [3, "3 mm"],
  [3.175, "1/8 in"],
  [4, "4 mm"],
  [6, "6 mm"],
  [6.35, "1/4 in"],
  [8, "8 mm"],
  [10, "10 mm"],
  [12, "12 mm"],
  [12.7, "1/2 in"],
] as const;
const GEOMETRIES = [
  ["single-flute", 1],
  ["o-flute", 1],
  ["upcut", 2],
  ["downcut", 2],
  ["compression", 2],
  ["straight", 3],
  ["straight", 4],
] as const;
const MATERIALS = [
  ["cast-acrylic", "Cast acrylic", "plastics", ["PMMA"]],
  ["hdpe", "HDPE", "plastics", ["polyethylene"]],
  ["polycarbonate", "Polycarbonate", "plastics", []],
  ["acetal", "Acetal", "plastics", ["POM"]],
  ["mdf", "MDF", "wood", []],
  ["plywood", "Birch plywood", "wood", ["ply"]],
  ["oak", "Hardwood (oak)", "wood", ["oak"]],
  ["pine", "Softwood (pine)", "wood", ["pine"]],
  ["aluminium-6061", "Aluminium 6061", "non-ferrous", ["aluminum"]],
  ["brass", "Brass", "non-ferrous", []],
  ["g10", "G10 glass epoxy", "composites", ["FR4"]],
  ["cfrp", "Carbon-fibre laminate", "composites", ["CFRP"]],
] as const;
const CLASSES = [
  ["light-router", "Light belt-drive router"],
  ["rigid-router", "Rigid ball-screw router"],
  ["vmc", "Small machining centre"],
] as const;
const WORDS = [
  "sign",
  "letters",
  "jig",
  "fixture",
  "panel",
  "enclosure",
  "cabinet",
  "inlay",
  "engraving",
  "bracket",
  "tray",
  "lid",
  "gasket",
  "model",
];

export type BenchVendor = { id: string; slug: string; skus: string[] };

/** One vendor: a catalogue and `sheets` sheets, each with one published version. */
export async function createBenchVendor(knex: Knex, index: number, sheets: number): Promise<BenchVendor> {
  const slug = `bench-${String(index).padStart(2, "0")}`;
  const [{ id: vendorId }] = await knex("vendors")
    .insert({ slug, name: `Bench vendor ${index}`, settings: "{}" })
    .returning("id");
  const cutters: { id: string; sku: string; name: string; d: number }[] = [];
  for (let i = 0; i < 40; i++) {
    const [d, label] = pick(SIZES);
    const [geometry, z] = pick(GEOMETRIES);
    const sku = `B${index}-${geometry.slice(0, 2).toUpperCase()}${z}-${String(d).replace(".", "")}-${i}`;
    const name = `${label} ${z}-flute ${geometry} cutter`;
    const [row] = await knex("cutters")
      .insert({
        vendor_id: vendorId,
        sku,
        name,
        diameter_mm: d,
        flutes: z,
        flute_length_mm: d * 3,
        overall_length_mm: 60,
        shank_mm: d,
        corner_form: rand() < 0.15 ? "ball" : "square",
        geometry,
        short_code: `b${index}x${i}`,
      })
      .returning("id");
    cutters.push({ id: row.id, sku, name, d });
  }
  const materials: { id: string; slug: string; name: string }[] = [];
  for (const [mslug, name, group, synonyms] of MATERIALS) {
    const [row] = await knex("materials")
      .insert({
        vendor_id: vendorId,
        slug: mslug,
        name,
        material_group: group,
        vc_min_mpm: 100,
        vc_max_mpm: 300,
        min_chip_load_mm: 0.02,
        kc_nmm2: 100,
        synonyms: [...synonyms],
      })
      .returning("id");
    materials.push({ id: row.id, slug: mslug, name });
  }
  const classes: { id: string; slug: string; name: string }[] = [];
  for (const [kslug, name] of CLASSES) {
    const [row] = await knex("machine_classes")
      .insert({ vendor_id: vendorId, slug: kslug, name, rpm_min: 6000, rpm_max: 24000, power_kw: 2, max_feed_mm_min: 10000, rigidity: 0.6 })
      .returning("id");
    classes.push({ id: row.id as string, slug: kslug, name });
  }
  for (let start = 0; start < sheets; start += 500) {
    const batch = Array.from({ length: Math.min(500, sheets - start) }, (_, j) => {
      const c = pick(cutters),
        m = pick(materials),
        k = pick(classes);
      return {
        c,
        m,
        k,
        slug: `${m.slug}-${c.sku.toLowerCase()}-${k.slug}-${start + j}`,
        kinds: [pick(OPERATION_KINDS), pick(OPERATION_KINDS)],
        word: pick(WORDS),
      };
    });
    const ids = await knex("sheets")
      .insert(batch.map((s) => ({ vendor_id: vendorId, slug: s.slug, cutter_id: s.c.id, material_id: s.m.id, machine_class_id: s.k.id })))
      .returning("id");
    await knex("sheet_versions").insert(
      batch.map((s, j) => ({
        vendor_id: vendorId,
        sheet_id: ids[j].id,
        number: 1,
        state: "published",
        title: `${s.m.name}, ${s.c.name}`,
        source: `## About\n\nInvented bench data for a ${s.word} in ${s.m.name.toLowerCase()} with ${s.c.sku} on a ${s.k.name.toLowerCase()}.\n`,
        front_matter: JSON.stringify({
          summary: `${s.kinds.join(" and ")} in ${s.m.name.toLowerCase()} for a ${s.word}.`,
          operations: [...new Set(s.kinds)].map((kind) => ({ kind })),
          tags: ["bench", s.word],
        }),
        published_at: new Date(Date.UTC(2026, 0, 1) + (start + j) * 60_000),
      })),
    );
  }
  return { id: vendorId, slug, skus: cutters.map((c) => c.sku) };
}

/** A realistic mix: sizes with materials and cuts, synonyms, typos, SKUs, free words, an empty box. */
export function queryMix(vendors: readonly BenchVendor[], count: number): { vendorId: string; q: string }[] {
  const templates = [
    () => "1/8 acrylic slot",
    () => "1/4 2F hdpe profile",
    () => "6mm mdf",
    () => "3.175 mm polycarbonate",
    () => '0.25" plywood compression',
    () => "alumnium",
    () => "plexi",
    () => "oak ball nose",
    () => "aluminum adaptive 6 mm",
    () => "carbon fibre 4mm",
    () => "pine pocket",
    () => pick(WORDS),
    () => `${pick(WORDS)} ${pick(["acrylic", "mdf", "ply"])}`,
    () => "",
    () => "12 mm 3 flute brass finishing",
    () => "fr4 drilling",
  ];
  return Array.from({ length: count }, () => {
    const v = pick(vendors);
    return { vendorId: v.id, q: rand() < 0.12 ? pick(v.skus) : pick(templates)() };
  });
}
