/** Operation kinds, the same keys as content-schema/sheet-kinds.ts (the engine imports no zod). */
export const OPERATION_KINDS = [
  "slotting",
  "pocket",
  "constant-engagement",
  "profile",
  "finishing",
  "plunge",
  "ramp",
  "helical",
  "drilling",
] as const;
export type OperationKind = (typeof OPERATION_KINDS)[number];

/** Keys stored before the rename, still accepted on input (API bodies, front matter of stored versions). */
export const LEGACY_OPERATION_KINDS = { adaptive: "constant-engagement" } as const satisfies Record<string, OperationKind>;

const LEGACY: ReadonlyMap<string, OperationKind> = new Map(Object.entries(LEGACY_OPERATION_KINDS));

/** Maps an old key to its current one; any other string comes back unchanged (validation happens elsewhere). */
export function normalizeOperationKind(kind: string): string {
  return LEGACY.get(kind) ?? kind;
}

const KINDS: ReadonlySet<string> = new Set(OPERATION_KINDS);

export const isOperationKind = (kind: string): kind is OperationKind => KINDS.has(kind);

/** The current key for a current or old key; undefined for anything else. */
export function toOperationKind(kind: string): OperationKind | undefined {
  // A current key first (one lookup on every adaptation); an old key maps to a current one.
  return isOperationKind(kind) ? kind : LEGACY.get(kind);
}
