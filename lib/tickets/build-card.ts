import "server-only";

import { operationKindLabels } from "@/content-schema/sheet-front-matter";
import type { TicketCard, TicketCardOperation } from "@/content-schema/ticket-card";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";
import { adaptRecipe, isMachiningInputError, RULES, WARNING_CODES } from "@/lib/machining";

import { readOperations, toAdaptInput, type CutterRow, type MachineClassRow, type MachineRow, type MaterialRow } from "./card-input";
import { READABLE_STATES } from "./resolve-ticket-links";

type Options = { vendorId: string; sheetVersionId: string; machineId: string; customerId: string };

/** A sheet version adapted to the customer's machine, computed now, for storing with a reply. */
export async function buildCard({ vendorId, sheetVersionId, machineId, customerId }: Options): Promise<TicketCard> {
  const version = await db("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "v.id": sheetVersionId, "v.vendor_id": vendorId, "s.vendor_id": vendorId })
    .whereIn("v.state", READABLE_STATES)
    .first("v.id", "v.number", "v.title", "v.front_matter", "s.slug", "s.cutter_id", "s.material_id", "s.machine_class_id");
  if (!version)
    throw new InvalidInput("Please correct the marked fields.", { cardSheetVersionId: ["That sheet version is not available."] });
  const machine = await db("machines")
    .where({ id: machineId, vendor_id: vendorId, user_id: customerId })
    .first<(MachineRow & { id: string; name: string; units: "metric" | "imperial" }) | undefined>();
  if (!machine) throw new InvalidInput("Please correct the marked fields.", { cardMachineId: ["Choose one of the customer's machines."] });
  const [cutter, material, machineClass] = await Promise.all([
    db("cutters").where({ id: version.cutter_id, vendor_id: vendorId }).first<CutterRow>(),
    db("materials").where({ id: version.material_id, vendor_id: vendorId }).first<MaterialRow>(),
    db("machine_classes").where({ id: version.machine_class_id, vendor_id: vendorId }).first<MachineClassRow>(),
  ]);

  const operations = readOperations(version.front_matter).map((op): TicketCardOperation => {
    const d = cutter.diameter_mm;
    const reference = {
      rpm: op.n.value,
      feedMmMin: op.vf.value,
      axialDepthMm: op.ap.value,
      radialDepthMm: op.ae.unit === "%D" ? (op.ae.value / 100) * d : op.ae.value,
      // fz = vf / (z · n); vc = π · D · n / 1000 (ISO 3002-1).
      chipLoadMm: op.vf.value / (cutter.flutes * op.n.value),
      cuttingSpeedMpm: (Math.PI * d * op.n.value) / 1000,
      plungeFeedMmMin: op.plungeFeed?.value ?? null,
    };
    const base = { label: op.label ?? operationKindLabels[op.kind], kind: op.kind, reference };
    try {
      const result = adaptRecipe(toAdaptInput(op, cutter, material, machineClass, machine));
      const { warnings, steps, ...adapted } = result;
      return {
        ...base,
        adapted,
        steps: steps.map((s) => ({ ...s, title: RULES.find((r) => r.id === s.rule)?.title ?? s.rule })),
        warnings: warnings.map((w) => ({ code: w.code, title: WARNING_CODES[w.code]?.title ?? w.code, message: w.message })),
      };
    } catch (error) {
      if (!isMachiningInputError(error)) throw error;
      return { ...base, adapted: null, error: error.message, steps: [], warnings: [] };
    }
  });
  const cautions = (version.front_matter as { cautions?: { kind: string; text: string }[] })?.cautions ?? [];
  return {
    sheetVersionId: version.id,
    sheetSlug: version.slug,
    versionNumber: version.number,
    title: version.title,
    machine: { id: machine.id, name: machine.name, units: machine.units },
    operations,
    cautions: cautions.filter((c) => typeof c?.text === "string").map((c) => ({ kind: String(c.kind), text: c.text })),
    computedAt: new Date().toISOString(),
  };
}
