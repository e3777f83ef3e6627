import { type AdaptResult, formatNumber, formatQuantity, QUANTITIES, RULES, type UnitSystem, WARNING_CODES } from "@/lib/machining";

import type { AdaptContext } from "./adapt-context";

// Pure: the numbers of one setup laid out for its PDF sheet and its CSV export, in the chosen units.

export type SheetRow = { symbol: string; label: string; unit: string; sheet: number | null; adapted: number | null; sheetText: string; adaptedText: string; sheetNumber: string; adaptedNumber: string };

export type SetupSheetData = {
  title: string;
  setupName: string;
  machineName: string;
  versionLabel: string;
  cutterLine: string;
  materialLine: string;
  operationLabel: string;
  rows: SheetRow[];
  steps: string[];
  warnings: string[];
  cautions: string[];
};

type Input = { context: AdaptContext; operationIndex: number; result: AdaptResult; setupName: string; machineName: string; units: UnitSystem };

export function setupSheetData({ context, operationIndex, result, setupName, machineName, units }: Input): SetupSheetData {
  const op = context.operations[operationIndex];
  const d = context.cutter.diameterMm;
  const row = (symbol: string, label: string, kind: keyof typeof QUANTITIES, sheet: number | null, adapted: number | null): SheetRow => ({
    symbol,
    label,
    unit: QUANTITIES[kind][units],
    sheet,
    adapted,
    sheetText: formatQuantity(sheet, kind, units),
    adaptedText: formatQuantity(adapted, kind, units),
    sheetNumber: sheet === null ? "" : formatNumber(sheet, kind, units),
    adaptedNumber: adapted === null ? "" : formatNumber(adapted, kind, units),
  });
  const rows: SheetRow[] = [
    row("n", "Spindle speed", "spindleSpeed", op?.rpm ?? null, result.rpm),
    row("vf", "Feed rate", "feedRate", op?.feedMmMin ?? null, result.feedMmMin),
    row("fz", "Chip load", "chipLoad", op ? op.feedMmMin / (context.cutter.flutes * op.rpm) : null, result.chipLoadMm),
    row("vc", "Cutting speed", "cuttingSpeed", op ? (Math.PI * d * op.rpm) / 1000 : null, result.cuttingSpeedMpm),
    row("ap", "Axial depth", "length", op?.axialDepthMm ?? null, result.axialDepthMm),
    row("ae", "Radial depth", "length", op?.radialDepthMm ?? null, result.radialDepthMm),
    row("vf plunge", "Plunge feed", "feedRate", op?.plungeFeedMmMin ?? null, result.plungeFeedMmMin),
    row("Q", "Removal rate", "removalRate", null, result.mrrCm3Min),
    row("Pc", "Cutting power", "power", null, result.powerKw),
  ];
  const title = (rule: string) => RULES.find((r) => r.id === rule)?.title ?? rule;
  return {
    title: context.title,
    setupName,
    machineName,
    versionLabel: `${context.sheetSlug}, version ${context.versionNumber}`,
    cutterLine: `${context.cutter.sku}: ${context.cutter.name}, D ${formatQuantity(d, "length", units)}, ${context.cutter.flutes} flute${context.cutter.flutes === 1 ? "" : "s"}`,
    materialLine: `${context.material.name}, vc ${formatQuantity(context.material.vcMinMpm, "cuttingSpeed", units)} to ${formatQuantity(context.material.vcMaxMpm, "cuttingSpeed", units)}, minimum fz ${formatQuantity(context.material.minChipLoadMm, "chipLoad", units)}, chip load band ${context.material.chipLoadMinPctD}–${context.material.chipLoadMaxPctD} % of D`,
    operationLabel: op?.label ?? "Operation",
    rows,
    steps: result.steps.map((s) => `${title(s.rule)}: ${formatQuantity(s.before, s.quantity, units)} → ${formatQuantity(s.after, s.quantity, units)}. ${s.why}`),
    warnings: result.warnings.filter((w) => w.code !== "standard-cautions").map((w) => `${WARNING_CODES[w.code]?.title ?? w.code}: ${w.message}`),
    cautions: [
      ...context.cautions.map((c) => c.text),
      "Starting points only. Wear eye and hearing protection, use dust extraction, never leave a cut unattended, and follow your machine maker's limits.",
    ],
  };
}
