import type { SetupOverrides } from "@/content-schema/setup-fields";
import type { AdaptContext } from "@/lib/adapt/adapt-context";
import { formatNumber, formatQuantity, QUANTITIES, RULES, WARNING_CODES, type AdaptResult, type UnitSystem } from "@/lib/machining";

// Pure: the numbers of one setup laid out for its PDF sheet and its CSV export, in the chosen units.

export type SheetRow = {
  symbol: string;
  label: string;
  unit: string;
  sheet: number | null;
  adapted: number | null;
  sheetText: string;
  adaptedText: string;
  sheetNumber: string;
  adaptedNumber: string;
  /** The adapted number differs from the sheet's. */
  changed: boolean;
};

export type SetupSheetData = {
  title: string;
  setupName: string;
  machineName: string;
  versionLabel: string;
  cutterLine: string;
  materialLine: string;
  operationLabel: string;
  rows: SheetRow[];
  /** The customer's own values (ae, ap, stick-out), as saved with the setup; empty when none. */
  yourChanges: string[];
  stickout: string;
  entryMethod: string;
  steps: string[];
  /** Said instead of the steps when no rule changed a number; never contradicts a number marked changed. */
  noStepsNote: string;
  warnings: string[];
  cautions: string[];
};

type Input = {
  context: AdaptContext;
  operationIndex: number;
  result: AdaptResult;
  setupName: string;
  machineName: string;
  units: UnitSystem;
  overrides?: SetupOverrides;
  machineStickoutMm?: number | null;
};

export const numbersDiffer = (sheet: number | null, adapted: number | null) =>
  sheet !== null && adapted !== null && Math.abs(adapted - sheet) > 1e-9 * Math.max(1, Math.abs(sheet));

/** The customer's saved overrides as lines ("ae (radial depth): 1.5 mm"), in the setup's units. */
export function describeOverrides(overrides: SetupOverrides | undefined, units: UnitSystem): string[] {
  const o = overrides ?? {};
  return [
    o.radialDepthMm !== undefined ? `ae (radial depth): ${formatQuantity(o.radialDepthMm, "length", units)}` : null,
    o.axialDepthMm !== undefined ? `ap (axial depth): ${formatQuantity(o.axialDepthMm, "length", units)}` : null,
    o.stickoutMm !== undefined ? `Stick-out: ${formatQuantity(o.stickoutMm, "length", units)}` : null,
  ].filter((line): line is string => line !== null);
}

/** How to enter the material: the engine's ramp advice when it gave one, else the sheet's plunge feed. */
export function entryMethod(result: AdaptResult, units: UnitSystem): string {
  if (result.warnings.some((w) => w.code === "ramp-entry-recommended"))
    return "Ramp or helical entry; no straight plunge with this cutter.";
  if (result.plungeFeedMmMin !== null)
    return `Straight plunge at ${formatQuantity(result.plungeFeedMmMin, "feedRate", units)}, or ramp in.`;
  return "The sheet gives no plunge feed: enter from outside the part or ramp in.";
}

export function noStepsNote(changedCount: number, hasOverrides: boolean): string {
  if (changedCount && hasOverrides) return "No rule changed a number. The numbers marked changed follow from your changes.";
  if (changedCount) return "No rule changed a number; the numbers marked changed follow from the machine's limits.";
  return "No rule changed a number: the sheet runs as written on this machine.";
}

export function setupSheetData({
  context,
  operationIndex,
  result,
  setupName,
  machineName,
  units,
  overrides,
  machineStickoutMm,
}: Input): SetupSheetData {
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
    changed: numbersDiffer(sheet, adapted),
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
  const yourChanges = describeOverrides(overrides, units);
  const stickoutMm = overrides?.stickoutMm ?? machineStickoutMm ?? null;
  return {
    title: context.title,
    setupName,
    machineName,
    versionLabel: `${context.sheetSlug}, version ${context.versionNumber}`,
    cutterLine: `${context.cutter.sku}: ${context.cutter.name}, D ${formatQuantity(d, "length", units)}, ${context.cutter.flutes} flute${context.cutter.flutes === 1 ? "" : "s"}`,
    materialLine: `${context.material.name}, vc ${formatQuantity(context.material.vcMinMpm, "cuttingSpeed", units)} to ${formatQuantity(context.material.vcMaxMpm, "cuttingSpeed", units)}, minimum fz ${formatQuantity(context.material.minChipLoadMm, "chipLoad", units)}, chip load band ${context.material.chipLoadMinPctD}–${context.material.chipLoadMaxPctD} % of D`,
    operationLabel: op?.label ?? "Operation",
    rows,
    yourChanges,
    stickout:
      stickoutMm === null
        ? "Not given (no deflection estimate)"
        : `${formatQuantity(stickoutMm, "length", units)}${overrides?.stickoutMm !== undefined ? " (your change)" : " (the machine's usual)"}`,
    entryMethod: entryMethod(result, units),
    noStepsNote: noStepsNote(rows.filter((r) => r.changed).length, yourChanges.length > 0),
    steps: result.steps.map(
      (s) => `${title(s.rule)}: ${formatQuantity(s.before, s.quantity, units)} → ${formatQuantity(s.after, s.quantity, units)}. ${s.why}`,
    ),
    warnings: result.warnings
      .filter((w) => w.code !== "standard-cautions")
      .map((w) => `${WARNING_CODES[w.code]?.title ?? w.code}: ${w.message}`),
    cautions: [
      ...context.cautions.map((c) => c.text),
      "Starting points only. Wear eye and hearing protection, use dust extraction, never leave a cut unattended, and follow your machine maker's limits.",
    ],
  };
}
