import { sheetOperationSchema, type SheetOperation } from "@/content-schema/sheet-front-matter";
import { operationKindLabels } from "@/content-schema/sheet-kinds";
import type { EntryKind } from "@/lib/machining";

import type { ContextOperation } from "./adapt-context";

const FIELDS = ["kind", "label", "n", "vf", "ap", "ae", "plungeFeed", "entry", "rampAngleDeg", "notes"] as const;

// Stored front matter holds parsed quantities ({ text, value }); re-parse from the author's text so the
// numbers always come from the same schema the sheet was validated with.
export function readStoredOperations(frontMatter: unknown): SheetOperation[] {
  const ops = (frontMatter as { operations?: unknown } | null)?.operations;
  if (!Array.isArray(ops)) return [];
  return ops.flatMap((raw) => {
    const plain: Record<string, unknown> = {};
    for (const key of FIELDS) {
      const value = (raw as Record<string, unknown>)?.[key];
      if (value === undefined || value === null) continue;
      plain[key] = typeof value === "object" && "text" in value ? (value as { text: unknown }).text : value;
    }
    const parsed = sheetOperationSchema.safeParse(plain);
    return parsed.success ? [parsed.data] : [];
  });
}

export function readStoredCautions(frontMatter: unknown): { kind: string; text: string }[] {
  const list = (frontMatter as { cautions?: unknown } | null)?.cautions;
  if (!Array.isArray(list)) return [];
  return list.flatMap((c) => (typeof c?.text === "string" ? [{ kind: String(c.kind ?? "general"), text: c.text as string }] : []));
}

// A sheet's entry method in the engine's words; pre-drilled and side entries have no entry move to judge.
const ENGINE_ENTRY: Partial<Record<SheetOperation["entry"], EntryKind>> = { plunge: "plunge", ramp: "ramp", helical: "helix" };

/** A sheet operation in metric machining units; ae as a share of D becomes mm. */
export function toContextOperation(op: SheetOperation, index: number, diameterMm: number): ContextOperation {
  return {
    index,
    label: op.label ?? operationKindLabels[op.kind],
    kind: op.kind,
    rpm: op.n.value,
    feedMmMin: op.vf.value,
    axialDepthMm: op.ap.value,
    radialDepthMm: op.ae.unit === "%D" ? (op.ae.value / 100) * diameterMm : op.ae.value,
    plungeFeedMmMin: op.plungeFeed?.value ?? null,
    entry: ENGINE_ENTRY[op.entry] ?? null,
    rampAngleDeg: op.rampAngleDeg ?? null,
  };
}
