import { OUTCOME_SYMPTOMS, type OutcomeResult, type OutcomeSymptom } from "@/content-schema/outcome-fields";
import { db } from "@/lib/db/knex";

import { createMember } from "./foundation";
import { createMachine } from "./tickets";

type Counts = { asWritten?: number; afterChanges?: number; failed?: Partial<Record<OutcomeSymptom, number>> };
type Change = Record<string, { from: number; to: number }>;

/** A customer with a machine, for outcome reports. Invented demo data. */
export async function createFieldCustomer(vendorId: string, machine: Record<string, unknown> = {}) {
  const member = await createMember(vendorId, "customer");
  const created = await createMachine(vendorId, member.user.id, machine);
  return { userId: member.user.id, email: member.user.email, machineId: created.id };
}

/**
 * Inserts setups and outcome reports on one version with exactly the given counts (bulk, no audit):
 * rollup tests need hundreds of rows with known totals, not the customer's form. `operationIndex` is the setups'
 * operation, `at` the reports' date (now when left out).
 */
export async function reportOutcomes(
  vendorId: string,
  versionId: string,
  counts: Counts,
  changes: Change[] = [{ feedMmMin: { from: 1000, to: 800 } }],
  { operationIndex = 0, at }: { operationIndex?: number; at?: Date } = {},
) {
  const customer = await createFieldCustomer(vendorId);
  const kinds: { result: OutcomeResult; symptom: OutcomeSymptom | null }[] = [
    ...Array.from({ length: counts.asWritten ?? 0 }, () => ({ result: "worked_as_written" as const, symptom: null })),
    ...Array.from({ length: counts.afterChanges ?? 0 }, () => ({ result: "worked_after_changes" as const, symptom: null })),
    ...OUTCOME_SYMPTOMS.flatMap((symptom) =>
      Array.from({ length: counts.failed?.[symptom] ?? 0 }, () => ({ result: "failed" as const, symptom })),
    ),
  ];
  if (!kinds.length) return customer;
  const setups = await db("setups")
    .insert(
      kinds.map(() => ({
        vendor_id: vendorId,
        user_id: customer.userId,
        machine_id: customer.machineId,
        sheet_version_id: versionId,
        operation_index: operationIndex,
        result: "{}",
      })),
    )
    .returning("id");
  let changeTurn = 0;
  await db("outcomes").insert(
    kinds.map((k, i) => ({
      vendor_id: vendorId,
      setup_id: setups[i].id,
      sheet_version_id: versionId,
      user_id: customer.userId,
      machine_id: customer.machineId,
      result: k.result,
      symptom: k.symptom,
      changes: JSON.stringify(k.result === "worked_after_changes" ? changes[changeTurn++ % changes.length] : {}),
      ...(at ? { created_at: at } : {}),
    })),
  );
  return customer;
}
