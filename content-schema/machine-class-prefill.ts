import { z } from "zod";

// Query parameters that prefill the new-machine-class form (from a Field-results coverage gap).
// Anything malformed is dropped: a prefill is a convenience, the form validates what is saved.
const number = (max: number) => z.coerce.number().positive().max(max).optional().catch(undefined);

export const machineClassPrefillSchema = z.object({
  rpmMin: number(100_000),
  rpmMax: number(100_000),
  powerKw: number(100),
  rigidity: z.coerce.number().positive().max(1).optional().catch(undefined),
  description: z.string().max(500).optional().catch(undefined),
});
export type MachineClassPrefill = z.infer<typeof machineClassPrefillSchema>;

/** The form's default values (strings, as the inputs hold them) for a parsed prefill. */
export function prefillDefaults(prefill: MachineClassPrefill): Record<string, string> {
  const out: Record<string, string> = { description: prefill.description ?? "" };
  for (const key of ["rpmMin", "rpmMax", "powerKw", "rigidity"] as const) if (prefill[key] !== undefined) out[key] = String(prefill[key]);
  return out;
}
