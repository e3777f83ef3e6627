import { z } from "zod";

import { LEGACY_OPERATION_KINDS, type OperationKind as EngineOperationKind } from "@/lib/machining/operation-kinds";

/** Operation kinds a sheet can describe, with the label shown to readers. */
export const operationKindLabels = {
  slotting: "Slot, full width",
  pocket: "Pocket clearing",
  "constant-engagement": "Constant-engagement clearing",
  profile: "Profile (contour)",
  finishing: "Finishing pass",
  plunge: "Plunge",
  ramp: "Ramp entry",
  helical: "Helical entry",
  drilling: "Drilling with an end mill",
} as const;

/** How the cutter gets into the material at the start of an operation. */
export const entryMethodLabels = {
  plunge: "Straight plunge",
  ramp: "Ramp",
  helical: "Helix",
  "pre-drilled": "Into a pre-drilled hole",
  none: "From outside the part",
} as const;

/** Hazard categories for caution boxes; the label is the word printed beside the icon. */
export const cautionKindLabels = {
  fire: "Fire risk",
  melting: "Melting",
  dust: "Dust",
  eye: "Eye protection",
  hearing: "Hearing protection",
  clamping: "Workholding",
  general: "Caution",
} as const;

type Keys<T> = [keyof T & string, ...(keyof T & string)[]];
const keysOf = <T extends object>(o: T) => Object.keys(o) as Keys<T>;

const operationKindEnum = z.enum(keysOf(operationKindLabels));
const legacyOperationKindSchema = z
  .enum(keysOf(LEGACY_OPERATION_KINDS))
  .describe("Older key, still read; answered as the current key")
  .transform((old): EngineOperationKind => LEGACY_OPERATION_KINDS[old]);
/** Accepts the keys stored before a rename (front matter of stored versions, API bodies) and answers the current key. */
export const operationKindSchema = z.union([operationKindEnum, legacyOperationKindSchema]);
export const entryMethodSchema = z.enum(keysOf(entryMethodLabels));
export const cautionKindSchema = z.enum(keysOf(cautionKindLabels));

export type OperationKind = z.infer<typeof operationKindSchema>;
export type EntryMethod = z.infer<typeof entryMethodSchema>;
export type CautionKind = z.infer<typeof cautionKindSchema>;

export const operationKinds = operationKindEnum.options;
export const entryMethods = entryMethodSchema.options;
export const cautionKinds = cautionKindSchema.options;
