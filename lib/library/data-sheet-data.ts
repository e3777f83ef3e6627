import { cornerFormLabels, geometryLabels } from "@/content-schema/catalogue-cutter";
import { materialGroupLabels } from "@/content-schema/catalogue-material";
import { cautionKindLabels } from "@/content-schema/sheet-kinds";
import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";
import { formatChipLoad, formatCuttingSpeed, formatFeed, formatLength, formatPower, formatSpindleSpeed } from "@/lib/machining";
import type { LibrarySheet } from "@/lib/sheets/find-library-sheet";
import { formatDate } from "@/lib/ui/dates";

import { operationCells } from "./operation-cells";
import { STANDARD_CAUTIONS } from "./standard-cautions";

// Pure: a readable sheet version laid out for print, every length, feed and speed in both unit systems.

export type BothUnits = { metric: string; imperial: string };
export type DataSheetOperation = {
  label: string;
  kind: string;
  notes: string | null;
  n: string;
  vf: BothUnits;
  fz: BothUnits | null;
  ap: BothUnits;
  ae: BothUnits;
  plunge: BothUnits;
  entry: string;
};
export type DataSheetData = {
  title: string;
  summary: string;
  slug: string;
  number: number;
  /** "Published 2 Dec 2026", or the superseded notice with the current version's number. */
  status: string;
  cutter: { sku: string; name: string; kind: string; specs: { symbol: string; name: string; value: BothUnits | string }[] };
  material: { name: string; lines: string[] };
  machineClass: { name: string; lines: string[] };
  operations: DataSheetOperation[];
  cautions: string[];
  url: string;
};

const both = (f: (units: "metric" | "imperial") => string): BothUnits => ({ metric: f("metric"), imperial: f("imperial") });
const pair = (b: BothUnits) => `${b.metric} (${b.imperial})`;

export function cutterSpecs(cutter: Cutter): DataSheetData["cutter"] {
  const len = (mm: number) => both((u) => formatLength(mm, u));
  return {
    sku: cutter.sku,
    name: cutter.name,
    kind: [
      geometryLabels[cutter.geometry],
      cornerFormLabels[cutter.cornerForm],
      cutter.toolMaterial === "hss" ? "HSS" : "Carbide",
      cutter.coating,
      cutter.helixDeg !== undefined ? `helix ${cutter.helixDeg}°` : null,
    ]
      .filter(Boolean)
      .join(" · "),
    specs: [
      { symbol: "DC", name: "cutting diameter", value: len(cutter.diameterMm) },
      { symbol: "APMX", name: "flute length", value: len(cutter.fluteLengthMm) },
      { symbol: "OAL", name: "overall length", value: len(cutter.overallLengthMm) },
      { symbol: "DMM", name: "shank diameter", value: len(cutter.shankMm) },
      { symbol: "ZEFP", name: "flutes", value: String(cutter.flutes) },
      { symbol: "RE", name: "corner radius", value: cutter.cornerRadiusMm ? len(cutter.cornerRadiusMm) : "—" },
    ],
  };
}

function materialLines(m: Material): string[] {
  return [
    materialGroupLabels[m.materialGroup],
    `vc window ${pair(both((u) => `${formatCuttingSpeed(m.vcMinMpm, u)} – ${formatCuttingSpeed(m.vcMaxMpm, u)}`))}`,
    `Minimum fz ${pair(both((u) => formatChipLoad(m.minChipLoadMm, u)))}; chip load band (hex) ${m.chipLoadMinPctD} – ${m.chipLoadMaxPctD} % of D`,
  ];
}

function classLines(k: MachineClass): string[] {
  return [
    `Spindle ${formatSpindleSpeed(k.rpmMin)} – ${formatSpindleSpeed(k.rpmMax)}, ${pair(both((u) => formatPower(k.powerKw, u)))}`,
    `Max feed ${pair(both((u) => formatFeed(k.maxFeedMmMin, u)))}; rigidity ${k.rigidity.toFixed(2)} (1 = stiffest)`,
  ];
}

export function dataSheetOperations(data: Pick<LibrarySheet, "frontMatter" | "cutter">): DataSheetOperation[] {
  const cutter = { flutes: data.cutter.flutes, diameterMm: data.cutter.diameterMm };
  return data.frontMatter.operations.map((op) => {
    const m = operationCells(op, "metric", cutter);
    const i = operationCells(op, "imperial", cutter);
    return {
      label: m.operation,
      kind: m.kind,
      notes: op.notes ?? null,
      n: m.n,
      vf: { metric: m.vf, imperial: i.vf },
      fz: m.fz && i.fz ? { metric: m.fz, imperial: i.fz } : null,
      ap: { metric: m.ap, imperial: i.ap },
      ae: { metric: m.ae, imperial: i.ae },
      plunge: { metric: m.plungeFeed, imperial: i.plungeFeed },
      entry: m.rampAngle ? `${m.entry}, ${m.rampAngle}` : m.entry,
    };
  });
}

/** The sheet's own cautions, each with its kind. */
export const ownCautions = (data: Pick<LibrarySheet, "frontMatter">): string[] =>
  data.frontMatter.cautions.map((c) => `${cautionKindLabels[c.kind]}: ${c.text}`);

/** The sheet's own cautions first, then the ones every sheet carries. */
export const dataSheetCautions = (data: Pick<LibrarySheet, "frontMatter">): string[] => [
  ...ownCautions(data),
  ...STANDARD_CAUTIONS.map((c) => c.text),
];

export function dataSheetData(data: LibrarySheet, url: string): DataSheetData {
  const { version, current } = data;
  const status =
    version.state === "superseded"
      ? `Superseded on ${formatDate(version.supersededAt)}${current ? `: the current version is ${current.number}` : ""}. Published ${formatDate(version.publishedAt)}.`
      : `Published ${formatDate(version.publishedAt)}`;
  return {
    title: version.title,
    summary: data.frontMatter.summary,
    slug: data.sheet.slug,
    number: version.number,
    status,
    cutter: cutterSpecs(data.cutter),
    material: { name: data.material.name, lines: materialLines(data.material) },
    machineClass: { name: data.machineClass.name, lines: classLines(data.machineClass) },
    operations: dataSheetOperations(data),
    cautions: dataSheetCautions(data),
    url,
  };
}
